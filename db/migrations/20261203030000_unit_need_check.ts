import type { Knex } from "knex";

// Claims never exceed a unit's need: claimed + built in ≤ cans + the unit's
// share of its drive's spare, ceil(cans × spare_percent / 100) (exact numeric
// arithmetic, rounded up; lib/heaters/need.ts rounds the same way).
//
// Why a trigger on the running totals rather than a new ledger_post: every
// claim, release, build, claim move and reversal changes a unit's totals
// through ledger_post's one UPDATE of stage_balances, which it runs while it
// holds the drive's lock, so this check sees settled totals and two claims at
// once cannot both slip under the limit. Living on the table, it stays in
// force whatever later version of ledger_post is written, and it also guards
// any future writer of the totals.
//
// It refuses only when the statement *raises* a unit's claimed + built in:
// building in moves cans from claimed to built in (net zero) and a release
// lowers it, so both stay possible even if the need shrank afterwards (a
// smaller spare percent). The refusal is SQLSTATE CT409 with JSON detail
// {kind:"need", heaterUnitId, cans, spare, need, had, remaining}, which
// lib/ledger/post.ts turns into "This unit needs only N more cans…".

const CHECK = `
create function stage_balances_unit_need() returns trigger language plpgsql as $$
declare
  r record;
begin
  for r in
    with raised as (
      select n.heater_unit_id as hu, n.drive_id, sum(n.quantity - coalesce(o.quantity, 0)) as delta
      from new_rows n
      left join old_rows o on o.drive_id = n.drive_id and o.heater_unit_id = n.heater_unit_id and o.stage = n.stage
        and o.drop_point_id is not distinct from n.drop_point_id
      where n.heater_unit_id is not null and n.stage in ('claimed', 'builtIn')
      group by n.heater_unit_id, n.drive_id
      having sum(n.quantity - coalesce(o.quantity, 0)) > 0
    )
    select x.hu, x.delta, u.cans, ceil(u.cans * coalesce(d.spare_percent, 0) / 100)::bigint as spare,
           (select coalesce(sum(b.quantity), 0) from stage_balances b
             where b.heater_unit_id = x.hu and b.stage in ('claimed', 'builtIn')) as total
    from raised x
    join heater_units u on u.id = x.hu
    left join drives d on d.id = coalesce(u.drive_id, x.drive_id)
  loop
    if r.total > r.cans + r.spare then
      raise exception 'claims would pass the unit''s need' using errcode = 'CT409',
        detail = json_build_object('kind', 'need', 'heaterUnitId', r.hu, 'cans', r.cans, 'spare', r.spare,
          'need', r.cans + r.spare, 'had', r.total - r.delta,
          'remaining', greatest(0, r.cans + r.spare - (r.total - r.delta)))::text;
    end if;
  end loop;
  return null;
end
$$;

create trigger stage_balances_unit_need
after update on stage_balances
referencing old table as old_rows new table as new_rows
for each statement execute function stage_balances_unit_need();
`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(CHECK);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop trigger if exists stage_balances_unit_need on stage_balances");
  await knex.raw("drop function if exists stage_balances_unit_need()");
}
