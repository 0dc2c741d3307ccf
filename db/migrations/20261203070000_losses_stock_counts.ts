import type { Knex } from "knex";

// Processing losses and stock counts (PRODUCT.md "Loss", "Stock count").
//
// A loss is a line from a processing stage to `rejected` with one of the loss
// reasons below; it feeds the drive's reject tallies like a sort's rejects do
// (a loss has no drop point, so only the drive-level tally moves).
//
// A stock count is a movement of kind `stockCount` whose lines run between a
// counted stage and "outside the ledger" (null), each with the line reason
// `stockCount`. Such lines are not counted cans: they must not feed the daily
// good-cans totals, the reject tallies or the drop-point tallies.
//
// ledger_post is replaced below. Its body is the one of
// 20261202006000_ledger_post_function.ts with exactly two marked changes
// ("-- [stock counts]" and "-- [losses]"); every other line is unchanged.
const SORT_REASONS = ["dented", "crushed", "wrongSize", "notAluminium", "damaged", "other"];
const LOSS_REASONS = ["damagedWashing", "damagedOpening", "damagedPunching"];
const KINDS = ["haul", "sort", "processing", "claim", "release", "builtIn", "recycling", "reversal"];

const list = (values: string[]) => values.map((v) => `'${v}'`).join(",");

async function setChecks(knex: Knex, reasons: string[], lineReasons: string[], kinds: string[]): Promise<void> {
  await knex.raw(`
    alter table ledger_lines drop constraint ledger_lines_reason_check,
      add constraint ledger_lines_reason_check check (reason is null or reason in (${list(lineReasons)}));
    alter table reject_tallies drop constraint reject_tallies_reason_check,
      add constraint reject_tallies_reason_check check (reason in (${list(reasons)}));
    alter table movements drop constraint movements_kind_check,
      add constraint movements_kind_check check (kind in (${list(kinds)}));
  `);
}

// Loss lines (a processing stage ↔ rejected, with a reason) move the drive's reject tally by reason.
// Insert-then-update, as in ledger_post: a CHECK applies to an upsert's proposed row.
const LOSS_TALLIES = `
create function ledger_post_loss_tallies(p jsonb, v_group uuid, v_drive uuid) returns void language plpgsql as $$
declare
  r record;
begin
  for r in
    select x.reason, sum(case when x."to" = 'rejected' then x.quantity else -x.quantity end)::bigint as delta
    from jsonb_to_recordset(p->'lines') as x("from" text, "to" text, quantity bigint, reason text)
    where x."from" is not null and x."to" is not null and 'rejected' in (x."from", x."to") and x.reason is not null
    group by x.reason
  loop
    insert into reject_tallies (group_id, drive_id, drop_point_id, reason, quantity)
    values (v_group, v_drive, null, r.reason, 0)
    on conflict on constraint reject_tallies_key do nothing;
    update reject_tallies set quantity = quantity + r.delta
    where drive_id = v_drive and drop_point_id is null and reason = r.reason;
  end loop;
end
$$;
`;

function postFunction(withLossesAndCounts: boolean): string {
  const skipCounts = withLossesAndCounts ? `\n      and x.reason is distinct from 'stockCount' -- [stock counts] an adjustment is not a counted can` : "";
  const losses = withLossesAndCounts ? `\n  -- [losses] cans lost in processing count as rejects by their reason.\n  perform ledger_post_loss_tallies(p, v_group, v_drive);\n` : "";
  return `
create or replace function ledger_post(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  v_actor uuid := (p->>'actorId')::uuid;
  v_at timestamptz := coalesce((p->>'occurredAt')::timestamptz, now());
  v_day date := coalesce((p->>'day')::date, (v_at at time zone 'UTC')::date);
  v_movement uuid := (p->>'existingMovementId')::uuid;
  v_line_ids jsonb;
  v_processed bigint;
  v_claimed bigint;
  v_change bigint;
  v_q bigint;
  v_dp uuid;
  r record;
begin
  -- Writes to one drive run one after another, so every check sees settled totals.
  perform 1 from drives where id = v_drive and group_id = v_group for no key update;
  if not found then
    raise exception 'ledger_post: no such drive in this group' using errcode = 'CT404';
  end if;

  for r in
    select d.stage, d.delta, coalesce(b.quantity, 0) as have
    from ledger_post_deltas(p) d
    left join stage_balances b on b.drive_id = v_drive and b.drop_point_id is not distinct from d.dp
      and b.heater_unit_id is not distinct from d.hu and b.stage = d.stage
    where d.delta < 0
    order by d.first_seen
  loop
    if r.have + r.delta < 0 then
      raise exception 'ledger_post: not enough cans' using errcode = 'CT409',
        detail = json_build_object('kind', 'debit', 'stage', r.stage, 'needed', -r.delta, 'available', r.have)::text;
    end if;
  end loop;

  if v_movement is null then
    insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, reverses_movement_id, details)
    values (coalesce((p->>'movementId')::uuid, gen_random_uuid()), v_group, v_drive, p->>'kind', v_actor, v_at,
            (p->>'reversesMovementId')::uuid, coalesce(p->'details', '{}'::jsonb))
    returning id into v_movement;
  end if;

  with ins as (
    insert into ledger_lines (movement_id, group_id, drive_id, drop_point_id, heater_unit_id, from_stage, to_stage, quantity,
                              reason, is_estimate, note, occurred_at, recorded_by, reverses_id, haul_id, sort_id)
    select v_movement, v_group, v_drive, x."dropPointId", x."heaterUnitId", x."from", x."to", x.quantity,
           x.reason, coalesce(x."isEstimate", false), coalesce(x.note, ''), v_at, v_actor, x."reversesId", x."haulId", x."sortId"
    from jsonb_array_elements(p->'lines') with ordinality as e(line, ord),
         jsonb_to_record(e.line) as x("from" text, "to" text, quantity integer, "dropPointId" uuid, "heaterUnitId" uuid,
                                      reason text, "isEstimate" boolean, note text, "reversesId" bigint, "haulId" uuid, "sortId" uuid)
    order by e.ord
    returning id
  )
  select coalesce(jsonb_agg(id order by id), '[]'::jsonb) into v_line_ids from ins;

  -- Insert-then-update: a CHECK applies to an upsert's proposed row, so a negative delta cannot ride on it.
  insert into stage_balances (group_id, drive_id, drop_point_id, heater_unit_id, stage, quantity)
  select v_group, v_drive, d.dp, d.hu, d.stage, 0 from ledger_post_deltas(p) d where d.delta <> 0
  on conflict on constraint stage_balances_key do nothing;
  update stage_balances b set quantity = b.quantity + d.delta
  from ledger_post_deltas(p) d
  where d.delta <> 0 and b.drive_id = v_drive and b.drop_point_id is not distinct from d.dp
    and b.heater_unit_id is not distinct from d.hu and b.stage = d.stage;

  -- Counted cans (a sort's good and rejects, or their reversal) feed the tallies and the daily totals.
  for r in
    select x.*, coalesce(x."from", x."to") as counted_stage, case when x."from" is null then 1 else -1 end as sign
    from jsonb_array_elements(p->'lines') with ordinality as e(line, ord),
         jsonb_to_record(e.line) as x("from" text, "to" text, quantity bigint, "dropPointId" uuid, reason text, "countedDay" date)
    where (x."from" is null or x."to" is null) and coalesce(x."from", x."to") in ('good', 'rejected')${skipCounts}
    order by e.ord
  loop
    v_q := r.sign * r.quantity;
    if r.counted_stage = 'good' then
      insert into drive_daily_good (drive_id, day, good_cans) values (v_drive, coalesce(r."countedDay", v_day), v_q)
      on conflict (drive_id, day) do update set good_cans = drive_daily_good.good_cans + excluded.good_cans;
    else
      foreach v_dp in array (case when r."dropPointId" is null then array[null::uuid] else array[null::uuid, r."dropPointId"] end) loop
        insert into reject_tallies (group_id, drive_id, drop_point_id, reason, quantity)
        values (v_group, v_drive, v_dp, coalesce(r.reason, 'other'), 0)
        on conflict on constraint reject_tallies_key do nothing;
        update reject_tallies set quantity = quantity + v_q
        where drive_id = v_drive and drop_point_id is not distinct from v_dp and reason = coalesce(r.reason, 'other');
      end loop;
    end if;
    if r."dropPointId" is not null then
      insert into drop_point_tallies (drop_point_id, group_id, drive_id) values (r."dropPointId", v_group, v_drive)
      on conflict (drop_point_id) do nothing;
      update drop_point_tallies
      set good_cans = good_cans + (case when r.counted_stage = 'good' then v_q else 0 end),
          rejected_cans = rejected_cans + (case when r.counted_stage = 'rejected' then v_q else 0 end)
      where drop_point_id = r."dropPointId";
    end if;
  end loop;
${losses}
  -- Claims reserve processed cans; no write may leave more claimed than there are.
  select coalesce(sum(quantity) filter (where stage <> 'claimed'), 0), coalesce(sum(quantity) filter (where stage = 'claimed'), 0)
  into v_processed, v_claimed
  from stage_balances
  where drive_id = v_drive and drop_point_id is null and heater_unit_id is null
    and stage in ('good', 'washed', 'opened', 'punched', 'claimed');
  if v_processed - v_claimed < 0 then
    select coalesce(sum(case when stage = 'claimed' then -delta else delta end), 0) into v_change
    from ledger_post_deltas(p)
    where dp is null and hu is null and stage in ('good', 'washed', 'opened', 'punched', 'claimed');
    raise exception 'ledger_post: not enough unclaimed cans' using errcode = 'CT409',
      detail = json_build_object('kind', 'unclaimed', 'available', v_processed - v_claimed - v_change)::text;
  end if;

  return jsonb_build_object('movementId', v_movement, 'lineIds', v_line_ids);
end
$$;
`;
}

export async function up(knex: Knex): Promise<void> {
  await setChecks(knex, [...SORT_REASONS, ...LOSS_REASONS], [...SORT_REASONS, ...LOSS_REASONS, "stockCount"], [...KINDS, "stockCount"]);
  await knex.raw(LOSS_TALLIES);
  await knex.raw(postFunction(true));
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(postFunction(false));
  await knex.raw("drop function if exists ledger_post_loss_tallies(jsonb, uuid, uuid)");
  await setChecks(knex, SORT_REASONS, SORT_REASONS, KINDS);
}
