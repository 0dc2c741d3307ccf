-- ledger_post(p jsonb): post one movement in one database call.
--
-- Applied by a migration with create or replace (see DEVELOPERS.md "Adding a
-- migration"): to change it, edit this file and add a one-line migration that
-- re-applies it. lib/ledger/post.ts builds `p` and turns the refusals
-- (SQLSTATE CT404 / CT409, detail as JSON) into the messages people see.
--
-- It locks the drive (so writes to one drive run one after another and every
-- check sees settled totals), checks every debit and the unclaimed total,
-- writes the movement, its lines and every running total, all before it
-- returns, so the drive's lock is never held across a network round trip.
--
-- p: { groupId, driveId, actorId, kind, occurredAt, day, movementId?,
--      existingMovementId?, reversesMovementId?, details,
--      expect?: { stage: quantity }   -- drive totals that must still hold (a stock count's)
--      lines: [{ from, to, quantity, dropPointId, heaterUnitId, reason,
--                isEstimate, note, haulId, sortId, reversesId, countedDay }] }

-- The one shape a line is read into: p->'lines' is parsed once, into an array of these.
-- (A type has no "create or replace": a change to its fields needs alter type in a migration.)
do $$
begin
  if to_regtype('ledger_line_in') is null then
    create type ledger_line_in as (
      "from" text, "to" text, quantity integer, "dropPointId" uuid, "heaterUnitId" uuid, reason text,
      "isEstimate" boolean, note text, "reversesId" bigint, "haulId" uuid, "sortId" uuid, "countedDay" date
    );
  end if;
end $$;

-- Net change per running-total row. A drive-level row (dp and hu null) for
-- every stage touched, plus the drop point's row for hauled cans and the
-- heater unit's row for claimed and built-in cans. first_seen keeps the
-- order in which the lines name them, so the first short debit is reported.
create or replace function ledger_post_deltas(lines ledger_line_in[])
returns table (dp uuid, hu uuid, stage text, delta bigint, first_seen bigint)
language sql immutable as $$
  with sides as (
    select l.ordinality as ord, 0 as side, l."from" as stage, -l.quantity::bigint as delta, l."dropPointId" as dp, l."heaterUnitId" as hu
    from unnest(lines) with ordinality as l where l."from" is not null
    union all
    select l.ordinality, 1, l."to", l.quantity::bigint, l."dropPointId", l."heaterUnitId"
    from unnest(lines) with ordinality as l where l."to" is not null
  ), keyed as (
    select ord * 4 + side * 2 as seen, null::uuid as dp, null::uuid as hu, stage, delta from sides
    union all
    select ord * 4 + side * 2 + 1, dp, null, stage, delta from sides where stage = 'hauled' and dp is not null
    union all
    select ord * 4 + side * 2 + 1, null, hu, stage, delta from sides where stage in ('claimed', 'builtIn') and hu is not null
  )
  select dp, hu, stage, sum(delta)::bigint, min(seen) from keyed group by dp, hu, stage
$$;

-- Locks a drive for ledger writes; another group's drive (or none) is CT404.
create or replace function ledger_lock_drive(v_group uuid, v_drive uuid) returns void language plpgsql as $$
begin
  perform 1 from drives where id = v_drive and group_id = v_group for no key update;
  if not found then
    raise exception 'ledger: no such drive in this group' using errcode = 'CT404', detail = '{"what":"drive"}';
  end if;
end
$$;

create or replace function ledger_post(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  v_actor uuid := (p->>'actorId')::uuid;
  v_at timestamptz := coalesce((p->>'occurredAt')::timestamptz, now());
  v_day date := coalesce((p->>'day')::date, (v_at at time zone 'UTC')::date);
  v_movement uuid := (p->>'existingMovementId')::uuid;
  v_lines ledger_line_in[];
  v_line_ids jsonb;
  v_totals jsonb;
  v_processed bigint;
  v_claimed bigint;
  v_change bigint;
  v_q bigint;
  v_dp uuid;
  r record;
begin
  -- Writes to one drive run one after another, so every check sees settled totals.
  perform ledger_lock_drive(v_group, v_drive);

  -- The only place the lines are parsed.
  select coalesce(array_agg(x), '{}') into v_lines from jsonb_populate_recordset(null::ledger_line_in, p->'lines') as x;

  -- A stock count's differences hold only while the totals are the ones it was counted against.
  if p->'expect' is not null then
    select jsonb_object_agg(b.stage, b.quantity) into v_totals
    from stage_balances b where b.drive_id = v_drive and b.drop_point_id is null and b.heater_unit_id is null;
    v_totals := coalesce(v_totals, '{}'::jsonb);
    if exists (select 1 from jsonb_each_text(p->'expect') e where coalesce((v_totals->>e.key)::bigint, 0) <> e.value::bigint) then
      raise exception 'ledger_post: totals changed' using errcode = 'CT409',
        detail = json_build_object('kind', 'stale', 'totals', v_totals)::text;
    end if;
  end if;

  for r in
    select d.stage, d.delta, coalesce(b.quantity, 0) as have
    from ledger_post_deltas(v_lines) d
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
    select v_movement, v_group, v_drive, l."dropPointId", l."heaterUnitId", l."from", l."to", l.quantity,
           l.reason, coalesce(l."isEstimate", false), coalesce(l.note, ''), v_at, v_actor, l."reversesId", l."haulId", l."sortId"
    from unnest(v_lines) with ordinality as l
    order by l.ordinality
    returning id
  )
  select coalesce(jsonb_agg(id order by id), '[]'::jsonb) into v_line_ids from ins;

  -- Insert-then-update: a CHECK applies to an upsert's proposed row, so a negative delta cannot ride on it.
  insert into stage_balances (group_id, drive_id, drop_point_id, heater_unit_id, stage, quantity)
  select v_group, v_drive, d.dp, d.hu, d.stage, 0 from ledger_post_deltas(v_lines) d where d.delta <> 0
  on conflict on constraint stage_balances_key do nothing;
  update stage_balances b set quantity = b.quantity + d.delta
  from ledger_post_deltas(v_lines) d
  where d.delta <> 0 and b.drive_id = v_drive and b.drop_point_id is not distinct from d.dp
    and b.heater_unit_id is not distinct from d.hu and b.stage = d.stage;

  -- Counted cans (a sort's good and rejects, or their reversal) feed the tallies and the daily totals.
  -- A stock count's adjustment (reason stockCount) is not a counted can.
  for r in
    select l.*, coalesce(l."from", l."to") as counted_stage, case when l."from" is null then 1 else -1 end as sign
    from unnest(v_lines) with ordinality as l
    where (l."from" is null or l."to" is null) and coalesce(l."from", l."to") in ('good', 'rejected')
      and l.reason is distinct from 'stockCount'
    order by l.ordinality
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

  -- Cans lost in processing (a processing stage <-> rejected, with a reason) count as the drive's rejects by reason.
  for r in
    select l.reason, sum(case when l."to" = 'rejected' then l.quantity else -l.quantity end)::bigint as delta
    from unnest(v_lines) with ordinality as l
    where l."from" is not null and l."to" is not null and 'rejected' in (l."from", l."to") and l.reason is not null
    group by l.reason
  loop
    insert into reject_tallies (group_id, drive_id, drop_point_id, reason, quantity)
    values (v_group, v_drive, null, r.reason, 0)
    on conflict on constraint reject_tallies_key do nothing;
    update reject_tallies set quantity = quantity + r.delta
    where drive_id = v_drive and drop_point_id is null and reason = r.reason;
  end loop;

  -- Claims reserve processed cans; no write may leave more claimed than there are.
  select coalesce(sum(quantity) filter (where stage <> 'claimed'), 0), coalesce(sum(quantity) filter (where stage = 'claimed'), 0)
  into v_processed, v_claimed
  from stage_balances
  where drive_id = v_drive and drop_point_id is null and heater_unit_id is null
    and stage in ('good', 'washed', 'opened', 'punched', 'claimed');
  if v_processed - v_claimed < 0 then
    select coalesce(sum(case when stage = 'claimed' then -delta else delta end), 0) into v_change
    from ledger_post_deltas(v_lines)
    where dp is null and hu is null and stage in ('good', 'washed', 'opened', 'punched', 'claimed');
    raise exception 'ledger_post: not enough unclaimed cans' using errcode = 'CT409',
      detail = json_build_object('kind', 'unclaimed', 'available', v_processed - v_claimed - v_change,
                                 'processed', v_processed, 'claimed', v_claimed)::text;
  end if;

  return jsonb_build_object('movementId', v_movement, 'lineIds', v_line_ids);
end
$$;
