-- Archives a heater unit or restores it (issue 16). p is ledger_post's payload (kind 'release')
-- plus p.unit = { id } and p.archive = true | false. Archiving locks the drive, then the unit,
-- refuses a unit with cans already built in (a real heater is stepped through its states, not
-- archived), gives every unbuilt claim back to the drive as one `release` movement (undoable
-- like any other; nothing is deleted) and stamps archived_at, so the unit stops counting toward
-- the drive's target. Restoring clears the stamp; released claims stay released.
create or replace function heater_unit_archive(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_drive uuid := (p->>'driveId')::uuid;
  v_unit uuid := (p#>>'{unit,id}')::uuid;
  v_archive boolean := (p->>'archive')::boolean;
  v_archived timestamptz;
  v_on_drive uuid;
  v_claimed bigint := 0;
  v_built bigint := 0;
  v_release jsonb;
begin
  if v_drive is not null then
    perform ledger_lock_drive(v_group, v_drive);
  end if;
  select archived_at, drive_id into v_archived, v_on_drive from heater_units where id = v_unit and group_id = v_group for no key update;
  if not found then
    raise exception 'heater_unit_archive: no such unit' using errcode = 'CT404', detail = '{"what":"unit"}';
  end if;
  if v_on_drive is distinct from v_drive then
    raise exception 'heater_unit_archive: unit moved' using errcode = 'CT409', detail = '{"kind":"unitMoved"}';
  end if;
  if not v_archive then
    if v_archived is null then
      raise exception 'heater_unit_archive: not archived' using errcode = 'CT409', detail = '{"kind":"notArchived"}';
    end if;
    update heater_units set archived_at = null where id = v_unit;
    return jsonb_build_object('released', 0, 'movementId', null);
  end if;
  if v_archived is not null then
    raise exception 'heater_unit_archive: already archived' using errcode = 'CT409', detail = '{"kind":"alreadyArchived"}';
  end if;
  select coalesce(sum(quantity), 0) into v_built from stage_balances where heater_unit_id = v_unit and stage = 'builtIn';
  if v_built > 0 then
    raise exception 'heater_unit_archive: built in' using errcode = 'CT409',
      detail = jsonb_build_object('kind', 'builtIn', 'builtIn', v_built)::text;
  end if;
  if v_drive is not null then
    select coalesce(sum(quantity), 0) into v_claimed from stage_balances
    where heater_unit_id = v_unit and drive_id = v_drive and stage = 'claimed';
    if v_claimed > 0 then
      v_release := ledger_unit(p || jsonb_build_object('lines', jsonb_build_array(jsonb_build_object(
        'from', 'claimed', 'to', null, 'quantity', v_claimed, 'heaterUnitId', v_unit, 'note', coalesce(p->>'note', '')))));
    end if;
  end if;
  update heater_units set archived_at = now() where id = v_unit;
  return jsonb_build_object('released', v_claimed, 'movementId', v_release->'movementId');
end
$$;
