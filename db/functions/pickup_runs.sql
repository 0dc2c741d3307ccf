-- A pickup run's edits and its cancel (issue 16). Each is ONE call, like the ledger's writers: the
-- TypeScript side reads the run without a lock, checks the input for clear messages and works out the
-- new order and legs (lib/runs/edit.ts); the function takes the drive's lock, then the run's (the order
-- ledger_haul and ledger_reverse take them in), re-checks what could have changed meanwhile and writes.
-- Refusals: CT404 {what:"run"|"dropPoint"}, CT409 {kind:"runClosed", state} for a done or cancelled run,
-- {kind:"stopSettled"} when a logged or skipped stop would be removed, {kind:"stopsChanged"} when the
-- stops named are no longer the run's.

-- Takes the drive's lock, then the run's row, and refuses a run that is not the group's and drive's
-- (CT404) or is done or cancelled (CT409 runClosed). Shared by the edit and the cancel below.
create or replace function pickup_run_lock_open(v_group uuid, v_drive uuid, v_run uuid) returns void language plpgsql as $$
declare
  v_state text;
begin
  perform ledger_lock_drive(v_group, v_drive);
  select state into v_state from pickup_runs where id = v_run and group_id = v_group and drive_id = v_drive for update;
  if not found then
    raise exception 'pickup_run: no such run' using errcode = 'CT404', detail = '{"what":"run"}';
  end if;
  if v_state in ('done', 'cancelled') then
    raise exception 'pickup_run: run closed' using errcode = 'CT409', detail = jsonb_build_object('kind', 'runClosed', 'state', v_state)::text;
  end if;
end
$$;

-- p = { groupId, driveId, runId, plannedOn?, assigneeId?, notes?,
--       stops?: [{ id: uuid|null (null = a new stop), dropPointId, legKm }], distanceKm? }
-- Only the keys present are changed. Answers { state, stops, logged, skipped }.
create or replace function pickup_run_edit(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  v_run uuid := (p->>'runId')::uuid;
  v_named int;
  v_found int;
  s record;
begin
  perform pickup_run_lock_open(v_group, v_drive, v_run);
  update pickup_runs set
    planned_on = case when p ? 'plannedOn' then (p->>'plannedOn')::date else planned_on end,
    assignee_id = case when p ? 'assigneeId' then (p->>'assigneeId')::uuid else assignee_id end,
    notes = case when p ? 'notes' then p->>'notes' else notes end,
    distance_km = case when p ? 'distanceKm' then (p->>'distanceKm')::double precision else distance_km end,
    updated_at = now()
  where id = v_run;
  if p ? 'stops' then
    -- Every stop named must still be this run's.
    select count(*)::int into v_named from jsonb_array_elements(p->'stops') x where x->>'id' is not null;
    select count(*)::int into v_found from pickup_run_stops
    where run_id = v_run and id in (select (x->>'id')::uuid from jsonb_array_elements(p->'stops') x where x->>'id' is not null);
    if v_found <> v_named then
      raise exception 'pickup_run_edit: stops changed' using errcode = 'CT409', detail = '{"kind":"stopsChanged"}';
    end if;
    -- A stop that was logged or skipped is history: it stays on the run.
    perform 1 from pickup_run_stops where run_id = v_run and status <> 'pending'
      and id not in (select (x->>'id')::uuid from jsonb_array_elements(p->'stops') x where x->>'id' is not null);
    if found then
      raise exception 'pickup_run_edit: settled stop removed' using errcode = 'CT409', detail = '{"kind":"stopSettled"}';
    end if;
    -- New stops: drop points of this drive and group only, and not archived (out of every plan).
    perform 1 from jsonb_array_elements(p->'stops') x
    where x->>'id' is null and not exists (
      select 1 from drop_points d where d.id = (x->>'dropPointId')::uuid and d.drive_id = v_drive and d.group_id = v_group
        and d.archived_at is null);
    if found then
      raise exception 'pickup_run_edit: no such drop point' using errcode = 'CT404', detail = '{"what":"dropPoint"}';
    end if;
    delete from pickup_run_stops where run_id = v_run
      and id not in (select (x->>'id')::uuid from jsonb_array_elements(p->'stops') x where x->>'id' is not null);
    -- Out of the way first: (run_id, position) is unique.
    update pickup_run_stops set position = -position where run_id = v_run;
    for s in select x, n from jsonb_array_elements(p->'stops') with ordinality as t(x, n) loop
      if s.x->>'id' is null then
        insert into pickup_run_stops (run_id, group_id, drop_point_id, position, leg_km)
        values (v_run, v_group, (s.x->>'dropPointId')::uuid, s.n, (s.x->>'legKm')::double precision);
      else
        update pickup_run_stops set position = s.n, leg_km = (s.x->>'legKm')::double precision where id = (s.x->>'id')::uuid;
      end if;
    end loop;
  end if;
  return pickup_run_follow_stops(v_run, false);
end
$$;

-- p = { groupId, driveId, runId, actorId, reason }. The run stays, cancelled; its pending stops are
-- released; logged and skipped stops, their hauls and every ledger line are left as they are.
-- Answers { state: "cancelled", released }.
create or replace function pickup_run_cancel(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  v_run uuid := (p->>'runId')::uuid;
  v_released int;
begin
  perform pickup_run_lock_open(v_group, v_drive, v_run);
  update pickup_runs set state = 'cancelled', cancelled_at = now(), cancelled_by = (p->>'actorId')::uuid,
    cancel_reason = p->>'reason', updated_at = now()
  where id = v_run;
  update pickup_run_stops set status = 'released', resolved_at = now(), resolved_by = (p->>'actorId')::uuid
  where run_id = v_run and status = 'pending';
  get diagnostics v_released = row_count;
  return jsonb_build_object('state', 'cancelled', 'released', v_released);
end
$$;
