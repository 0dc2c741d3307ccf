-- The ledger's writers that keep more than lines and totals: hauls, sorts,
-- undoing an entry, and a heater unit's claims. Each is one database call that
-- locks the drive, re-checks what the caller read before the lock, writes its
-- own rows and bookkeeping and posts the lines with ledger_post, so the
-- drive's lock is never held across a network round trip. Applied like
-- ledger_post.sql (DEVELOPERS.md "Adding a migration").
--
-- The caller (lib/ledger/write*.ts, reverse.ts) reads and computes beforehand
-- what does not change under the lock (a haul's estimate, a sort's shares, the
-- lines an undo reverses) and chooses the new rows' ids. Refusals are CT404
-- (detail {what}) and CT409 (detail {kind, ...}).

-- A haul: p is ledger_post's payload (kind 'haul', movementId, lines) plus
-- p.haul = { id, dropPointId, bags, weightKg, estimatedCans, method, perUnit, countedHauls }
-- and, for a haul logged at a pickup-run stop, p.stop = { runId, stopId, assigneeId }
-- (assigneeId: the volunteer who must hold the run, null for an organiser). The stop is then
-- settled in the same call: the run is locked after the drive, the stop must still be
-- pending (else CT409 stopSettled), and the run's state follows its stops
-- (pickup_run_follow_stops). Answers { movementId, haulId, stop?: { resolvedAt, run } }.
create or replace function ledger_haul(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  h jsonb := p->'haul';
  s jsonb := p->'stop';
  v_dp uuid := (h->>'dropPointId')::uuid;
  v_at timestamptz := (p->>'occurredAt')::timestamptz;
  v_status text;
  v_resolved timestamptz;
begin
  perform ledger_lock_drive(v_group, v_drive);
  perform 1 from drop_points where id = v_dp and drive_id = v_drive and group_id = v_group;
  if not found then
    raise exception 'ledger_haul: no such drop point' using errcode = 'CT404', detail = '{"what":"dropPoint"}';
  end if;
  if s is not null and jsonb_typeof(s) = 'object' then
    perform 1 from pickup_runs where id = (s->>'runId')::uuid and group_id = v_group and drive_id = v_drive
      and (s->>'assigneeId' is null or assignee_id = (s->>'assigneeId')::uuid) for update;
    if not found then
      raise exception 'ledger_haul: no such run' using errcode = 'CT404', detail = '{"what":"run"}';
    end if;
    select status into v_status from pickup_run_stops
    where id = (s->>'stopId')::uuid and run_id = (s->>'runId')::uuid and group_id = v_group and drop_point_id = v_dp;
    if not found then
      raise exception 'ledger_haul: no such stop' using errcode = 'CT404', detail = '{"what":"stop"}';
    end if;
    if v_status <> 'pending' then
      raise exception 'ledger_haul: stop settled' using errcode = 'CT409', detail = jsonb_build_object('kind', 'stopSettled', 'status', v_status)::text;
    end if;
  end if;
  insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, details)
  values ((p->>'movementId')::uuid, v_group, v_drive, 'haul', (p->>'actorId')::uuid, v_at, '{}');
  insert into hauls (id, group_id, drive_id, drop_point_id, movement_id, bags, weight_kg, estimated_cans, estimate_method,
                     estimate_per_unit, estimate_counted_hauls, hauled_at, recorded_by)
  values ((h->>'id')::uuid, v_group, v_drive, v_dp, (p->>'movementId')::uuid, (h->>'bags')::int, (h->>'weightKg')::numeric,
          (h->>'estimatedCans')::int, h->>'method', (h->>'perUnit')::double precision, (h->>'countedHauls')::int, v_at,
          (p->>'actorId')::uuid);
  if jsonb_array_length(p->'lines') > 0 then
    perform ledger_post(p || jsonb_build_object('existingMovementId', p->>'movementId'));
  end if;
  perform ledger_bump_drop_point(v_group, v_drive, v_dp, 1, (h->>'bags')::int);
  if v_status is null then
    return jsonb_build_object('movementId', p->>'movementId', 'haulId', h->>'id');
  end if;
  -- The unique index pickup_run_stops_haul_unique holds too: this haul is new, so it settles this stop alone.
  update pickup_run_stops set status = 'logged', haul_id = (h->>'id')::uuid, skip_reason = null,
    resolved_by = (p->>'actorId')::uuid, resolved_at = now()
  where id = (s->>'stopId')::uuid
  returning resolved_at into v_resolved;
  return jsonb_build_object('movementId', p->>'movementId', 'haulId', h->>'id', 'stop', jsonb_build_object(
    'resolvedAt', v_resolved, 'run', pickup_run_follow_stops((s->>'runId')::uuid, true)));
end
$$;

-- A run's state follows its stops (the one place this rule lives): done when none
-- is pending, under way when some is not, else planned; finished_at only while it is done.
-- v_starts: a stop was just settled, so the run has started (started_at kept once set).
-- The caller holds the run's row (or the drive's lock, for an undo). Answers { state, stops, logged, skipped }.
-- A cancelled run (pickup_run_cancel, db/functions/pickup_runs.sql) stays cancelled: a stop an undo
-- reopens on it is released at once, never pending again.
create or replace function pickup_run_follow_stops(v_run uuid, v_starts boolean) returns jsonb language plpgsql as $$
declare
  c record;
  v_state text;
  v_cancelled timestamptz;
begin
  select cancelled_at into v_cancelled from pickup_runs where id = v_run;
  if v_cancelled is not null then
    update pickup_run_stops set status = 'released', resolved_at = coalesce(resolved_at, now()) where run_id = v_run and status = 'pending';
    select count(*)::int as stops, count(*) filter (where status = 'logged')::int as logged,
           count(*) filter (where status = 'skipped')::int as skipped
    into c from pickup_run_stops where run_id = v_run;
    return jsonb_build_object('state', 'cancelled', 'stops', c.stops, 'logged', c.logged, 'skipped', c.skipped);
  end if;
  select count(*)::int as stops, count(*) filter (where status = 'pending')::int as pending,
         count(*) filter (where status = 'logged')::int as logged, count(*) filter (where status = 'skipped')::int as skipped
  into c from pickup_run_stops where run_id = v_run;
  v_state := case when c.stops > 0 and c.pending = 0 then 'done' when c.pending < c.stops then 'under_way' else 'planned' end;
  update pickup_runs set state = v_state,
    started_at = case when v_starts then coalesce(started_at, now()) else started_at end,
    finished_at = case when v_state = 'done' then coalesce(finished_at, now()) end
  where id = v_run;
  return jsonb_build_object('state', v_state, 'stops', c.stops, 'logged', c.logged, 'skipped', c.skipped);
end
$$;

create or replace function ledger_bump_drop_point(v_group uuid, v_drive uuid, v_dp uuid, v_hauls int, v_bags int) returns void language sql as $$
  insert into drop_point_tallies (drop_point_id, group_id, drive_id) values (v_dp, v_group, v_drive) on conflict (drop_point_id) do nothing;
  update drop_point_tallies set hauls = hauls + v_hauls, bags = bags + v_bags where drop_point_id = v_dp;
$$;

-- The group's running sums for the ratio estimators, moved by a sort (sign 1) or its undo (-1).
-- c = { weight: { hauls, cans, kg }, bags: { hauls, cans, bags } } (lib/ledger/calibration.ts calibrationDelta).
create or replace function ledger_apply_calibration(v_group uuid, c jsonb, sign int) returns void language sql as $$
  insert into group_calibration (group_id) values (v_group) on conflict (group_id) do nothing;
  update group_calibration set
    weight_hauls = weight_hauls + sign * (c#>>'{weight,hauls}')::int,
    weight_cans = weight_cans + sign * (c#>>'{weight,cans}')::bigint,
    weight_kg = weight_kg + sign * (c#>>'{weight,kg}')::numeric,
    bag_hauls = bag_hauls + sign * (c#>>'{bags,hauls}')::int,
    bag_cans = bag_cans + sign * (c#>>'{bags,cans}')::bigint,
    bags = bags + sign * (c#>>'{bags,bags}')::bigint
  where group_id = v_group;
$$;

-- A sort: p is ledger_post's payload (kind 'sort', movementId, details, lines with sortId) plus
-- p.sort = { id, haulIds, good, rejected, counted, haulCount, bags, weightKg, calibration }.
create or replace function ledger_sort(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  s jsonb := p->'sort';
  v_ids uuid[] := array(select jsonb_array_elements_text(s->'haulIds')::uuid);
  v_found int;
  v_reversed boolean;
  v_sorted boolean;
begin
  perform ledger_lock_drive(v_group, v_drive);
  select count(*), bool_or(reversed_at is not null), bool_or(sort_id is not null) into v_found, v_reversed, v_sorted
  from hauls where id = any (v_ids) and group_id = v_group and drive_id = v_drive;
  if v_found <> cardinality(v_ids) then
    raise exception 'ledger_sort: no such haul' using errcode = 'CT404', detail = '{"what":"haul"}';
  end if;
  if v_reversed then
    raise exception 'ledger_sort: haul undone' using errcode = 'CT409', detail = '{"kind":"haulUndone"}';
  end if;
  if v_sorted then
    raise exception 'ledger_sort: haul sorted' using errcode = 'CT409', detail = '{"kind":"haulSorted"}';
  end if;
  insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, details)
  values ((p->>'movementId')::uuid, v_group, v_drive, 'sort', (p->>'actorId')::uuid, (p->>'occurredAt')::timestamptz, p->'details');
  insert into sorts (id, group_id, drive_id, movement_id, good, rejected, counted, haul_count, bags, weight_kg, sorted_at, recorded_by)
  values ((s->>'id')::uuid, v_group, v_drive, (p->>'movementId')::uuid, (s->>'good')::int, s->'rejected', (s->>'counted')::int,
          (s->>'haulCount')::int, (s->>'bags')::int, (s->>'weightKg')::numeric, (p->>'occurredAt')::timestamptz, (p->>'actorId')::uuid);
  perform ledger_post(p || jsonb_build_object('existingMovementId', p->>'movementId'));
  update hauls set sort_id = (s->>'id')::uuid where id = any (v_ids);
  perform ledger_apply_calibration(v_group, s->'calibration', 1);
  return jsonb_build_object('movementId', p->>'movementId', 'sortId', s->>'id');
end
$$;

-- Undoing an entry: p is ledger_post's payload (kind 'reversal', movementId, reversesMovementId, the
-- reversed lines) plus p.undo = { kind, haulId?, dropPointId?, bags?, sortId?, calibration? }.
-- A haul's undo reopens the pickup-run stop it settled; the run's state then follows its stops
-- (pickup_run_follow_stops).
create or replace function ledger_reverse(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  u jsonb := p->'undo';
  v_run uuid;
  v_result jsonb;
begin
  perform ledger_lock_drive(v_group, v_drive);
  perform 1 from movements where reverses_movement_id = (p->>'reversesMovementId')::uuid;
  if found then
    raise exception 'ledger_reverse: already undone' using errcode = 'CT409', detail = '{"kind":"alreadyUndone"}';
  end if;
  if u->>'kind' = 'haul' then
    perform 1 from hauls where id = (u->>'haulId')::uuid and sort_id is not null;
    if found then
      raise exception 'ledger_reverse: haul sorted' using errcode = 'CT409', detail = '{"kind":"haulSorted"}';
    end if;
    update hauls set reversed_at = now() where id = (u->>'haulId')::uuid;
    perform ledger_bump_drop_point(v_group, v_drive, (u->>'dropPointId')::uuid, -1, -(u->>'bags')::int);
    update pickup_run_stops set status = 'pending', haul_id = null, skip_reason = null, resolved_by = null, resolved_at = null
    where haul_id = (u->>'haulId')::uuid and group_id = v_group
    returning run_id into v_run;
    if v_run is not null then
      perform pickup_run_follow_stops(v_run, false);
    end if;
  elsif u->>'kind' = 'sort' then
    update hauls set sort_id = null where sort_id = (u->>'sortId')::uuid;
    update sorts set reversed_at = now() where id = (u->>'sortId')::uuid;
    perform ledger_apply_calibration(v_group, u->'calibration', -1);
  end if;
  v_result := ledger_post(p);
  return v_result;
end
$$;

-- A heater unit's claim, release or building in: p is ledger_post's payload plus
-- p.unit = { id, action: 'claim' | 'release' | 'builtIn' }. The unit is locked after the drive
-- (the order every writer uses); it must still be on the drive the caller read. Returns the
-- unit's state and its claimed and built-in totals after the write.
create or replace function ledger_unit(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  v_unit uuid := (p#>>'{unit,id}')::uuid;
  v_action text := p#>>'{unit,action}';
  v_state text;
  v_next text;
  v_result jsonb;
begin
  perform ledger_lock_drive(v_group, v_drive);
  select state into v_state from heater_units where id = v_unit and group_id = v_group and drive_id = v_drive for no key update;
  if not found then
    raise exception 'ledger_unit: unit moved' using errcode = 'CT409', detail = '{"kind":"unitMoved"}';
  end if;
  -- An archived unit (migration 20261207010000) takes no new claims until it is restored.
  if v_action = 'claim' and exists (select 1 from heater_units where id = v_unit and archived_at is not null) then
    raise exception 'ledger_unit: archived' using errcode = 'CT409', detail = '{"kind":"unitArchived"}';
  end if;
  if v_action = 'claim' and v_state = 'installed' then
    raise exception 'ledger_unit: installed' using errcode = 'CT409', detail = '{"kind":"unitInstalled"}';
  end if;
  v_result := ledger_post(p);
  v_next := case
    when v_action = 'claim' and v_state = 'planned' then 'claiming'
    when v_action = 'builtIn' and v_state in ('planned', 'claiming') then 'building'
    else v_state end;
  if v_next <> v_state then
    update heater_units set state = v_next where id = v_unit;
  end if;
  return v_result || jsonb_build_object(
    'state', v_next,
    'claimed', (select coalesce(sum(quantity), 0) from stage_balances where heater_unit_id = v_unit and stage = 'claimed'),
    'builtIn', (select coalesce(sum(quantity), 0) from stage_balances where heater_unit_id = v_unit and stage = 'builtIn'));
end
$$;

-- Several heater-unit postings in one call, in order (a claim move: a release from one unit, then
-- a claim for another): ps is an array of ledger_unit payloads; answers the array of their answers.
-- A refusal of any undoes them all, and the drive's lock is taken and used inside this one call.
create or replace function ledger_units(ps jsonb) returns jsonb language plpgsql as $$
declare
  p jsonb;
  v_out jsonb := '[]'::jsonb;
begin
  for p in select e.x from jsonb_array_elements(ps) with ordinality as e(x, n) order by e.n loop
    v_out := v_out || jsonb_build_array(ledger_unit(p));
  end loop;
  return v_out;
end
$$;
