-- A heater unit's state move (planned → claiming → building → installed, or an
-- organiser's step back) in one database call, so the drive's lock is never
-- held across a network round trip. Applied like ledger_post.sql
-- (DEVELOPERS.md "Adding a migration").
--
-- Who may make which move is lib/heaters/states.ts checkStateMove: the caller
-- (lib/heaters/move-state.ts) reads the unit without a lock, checks the move
-- from the state it read, and sends that state as p.move.from. Here the drive
-- is locked, then the unit (the order every ledger writer uses); if the unit
-- is no longer on the drive the caller read (CT409 unitMoved) or no longer in
-- the state it checked (CT409 stateChanged, with the state now), nothing is
-- written and the caller checks again. Going on the wall gives the unit's
-- unbuilt claim back to the drive: a 'release' movement posted by ledger_unit.
--
-- p: ledger_post's payload for that release (groupId, driveId — null for a
-- unit on no drive —, actorId, kind 'release', occurredAt, day, details,
-- lines: []) plus unit = { id, action: 'release' }, move = { from, to } and
-- note (the release line's note). Answers { released, movementId }.
-- Shared by every writer of one heater unit (heater_unit_move, heater_unit_archive,
-- heater_unit_glazing): lock the drive (when the unit is on one), then the unit;
-- refuse CT404 when the unit is not the group's and CT409 unitMoved when it is no
-- longer on the drive the caller read. Answers the locked row.
create or replace function heater_unit_lock(p jsonb, who text) returns heater_units language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  v_row heater_units;
begin
  if v_drive is not null then
    perform ledger_lock_drive(v_group, v_drive);
  end if;
  select * into v_row from heater_units where id = (p#>>'{unit,id}')::uuid and group_id = v_group for no key update;
  if not found then
    raise exception '%: no such unit', who using errcode = 'CT404', detail = '{"what":"unit"}';
  end if;
  if v_row.drive_id is distinct from v_drive then
    raise exception '%: unit moved', who using errcode = 'CT409', detail = '{"kind":"unitMoved"}';
  end if;
  return v_row;
end
$$;

-- Gives a locked unit's unbuilt claim on its drive back as one 'release' movement
-- (ledger_unit; p is that release's payload, p.note the line's note). Answers
-- { released, movementId } (0 and null when nothing was claimed or the unit is on no drive).
create or replace function heater_unit_release_claims(p jsonb) returns jsonb language plpgsql as $$
declare
  v_drive uuid := (p->>'driveId')::uuid;
  v_unit uuid := (p#>>'{unit,id}')::uuid;
  v_claimed bigint := 0;
  v_release jsonb;
begin
  if v_drive is not null then
    select coalesce(sum(quantity), 0) into v_claimed from stage_balances
    where heater_unit_id = v_unit and drive_id = v_drive and stage = 'claimed';
    if v_claimed > 0 then
      v_release := ledger_unit(p || jsonb_build_object('lines', jsonb_build_array(jsonb_build_object(
        'from', 'claimed', 'to', null, 'quantity', v_claimed, 'heaterUnitId', v_unit, 'note', coalesce(p->>'note', '')))));
    end if;
  end if;
  return jsonb_build_object('released', v_claimed, 'movementId', v_release->'movementId');
end
$$;

create or replace function heater_unit_move(p jsonb) returns jsonb language plpgsql as $$
declare
  v_unit heater_units := heater_unit_lock(p, 'heater_unit_move');
  v_to text := p#>>'{move,to}';
  v_released jsonb := jsonb_build_object('released', 0, 'movementId', null);
begin
  if v_unit.state <> p#>>'{move,from}' then
    raise exception 'heater_unit_move: state changed' using errcode = 'CT409',
      detail = jsonb_build_object('kind', 'stateChanged', 'state', v_unit.state)::text;
  end if;
  if v_to = 'installed' then
    v_released := heater_unit_release_claims(p);
  end if;
  update heater_units set state = v_to, state_changed_at = now() where id = v_unit.id;
  return v_released;
end
$$;
