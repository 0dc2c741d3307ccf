-- A heater unit's spare: its share of the drive's spare allowance, cans × spare % / 100 rounded UP to
-- a whole can (exact numeric arithmetic), so a unit never runs one can short. The one place this rule
-- is written: the need trigger below, heater_unit_glazing (heater_unit_archive.sql) and the app's reads
-- of a unit's need (lib/heaters/queries.ts, lib/notify/unit-ready.ts) all call it.
-- Applied like ledger_post.sql (DEVELOPERS.md "Adding a migration").
create or replace function unit_spare(v_cans bigint, v_spare_percent numeric) returns bigint language sql immutable as $$
  select ceil(v_cans * coalesce(v_spare_percent, 0) / 100)::bigint
$$;

-- Claims never exceed a unit's need: claimed + built in ≤ cans + unit_spare (the trigger
-- stage_balances_unit_need, created in migration 20261203030000, which says why it is a trigger).
-- It refuses only when the statement raises a unit's claimed + built in, with SQLSTATE CT409 and
-- JSON detail {kind:"need", heaterUnitId, cans, spare, need, had, remaining}.
create or replace function stage_balances_unit_need() returns trigger language plpgsql as $$
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
    select x.hu, x.delta, u.cans, unit_spare(u.cans, d.spare_percent) as spare,
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
