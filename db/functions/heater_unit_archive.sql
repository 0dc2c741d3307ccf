-- Archives a heater unit or restores it (issue 16). p is ledger_post's payload (kind 'release')
-- plus p.unit = { id } and p.archive = true | false. Archiving locks the drive, then the unit
-- (heater_unit_lock, db/functions/heater_units.sql), refuses a unit with cans already built in (a
-- real heater is stepped through its states, not archived), gives every unbuilt claim back to the
-- drive as one `release` movement (heater_unit_release_claims: undoable like any other; nothing is
-- deleted) and stamps archived_at (archive_stamp, db/functions/records.sql), so the unit stops
-- counting toward the drive's target. Restoring clears the stamp; released claims stay released.
create or replace function heater_unit_archive(p jsonb) returns jsonb language plpgsql as $$
declare
  v_unit heater_units := heater_unit_lock(p, 'heater_unit_archive');
  v_archive boolean := (p->>'archive')::boolean;
  v_built bigint := 0;
  v_released jsonb := jsonb_build_object('released', 0, 'movementId', null);
begin
  if v_archive and v_unit.archived_at is null then
    select coalesce(sum(quantity), 0) into v_built from stage_balances where heater_unit_id = v_unit.id and stage = 'builtIn';
    if v_built > 0 then
      raise exception 'heater_unit_archive: built in' using errcode = 'CT409',
        detail = jsonb_build_object('kind', 'builtIn', 'builtIn', v_built)::text;
    end if;
    v_released := heater_unit_release_claims(p);
  end if;
  perform archive_stamp('heater_units', v_unit.id, v_unit.group_id, v_archive);
  return v_released;
end
$$;

-- A unit's glazing changes (issue 16): p = { groupId, driveId, unit: { id }, plan: { the heater_units
-- columns of the plan, columns, rows, cans } }, the counts computed by the caller from the plan
-- (lib/heaters/can-grid.ts). Under the drive's and the unit's locks it refuses (CT409) an installed
-- unit, and a grid whose need (cans + unit_spare, db/functions/unit_need.sql, as the need trigger
-- counts it) would fall below what is already claimed and built in, or whose cans would be fewer
-- than are built in. The drive's target follows, being Σ cans of its units.
create or replace function heater_unit_glazing(p jsonb) returns jsonb language plpgsql as $$
declare
  v_unit heater_units := heater_unit_lock(p, 'heater_unit_glazing');
  v_plan jsonb := p->'plan';
  v_cans bigint := (v_plan->>'cans')::bigint;
  v_spare bigint := 0;
  v_claimed bigint := 0;
  v_built bigint := 0;
begin
  if v_unit.state = 'installed' then
    raise exception 'heater_unit_glazing: installed' using errcode = 'CT409', detail = '{"kind":"unitInstalled"}';
  end if;
  select coalesce(sum(quantity) filter (where stage = 'claimed'), 0), coalesce(sum(quantity) filter (where stage = 'builtIn'), 0)
    into v_claimed, v_built from stage_balances where heater_unit_id = v_unit.id;
  if v_unit.drive_id is not null then
    select unit_spare(v_cans, spare_percent) into v_spare from drives where id = v_unit.drive_id;
  end if;
  if v_cans + v_spare < v_claimed + v_built or v_cans < v_built then
    raise exception 'heater_unit_glazing: below claims' using errcode = 'CT409',
      detail = jsonb_build_object('kind', 'belowClaims', 'cans', v_cans, 'spare', v_spare, 'claimed', v_claimed, 'builtIn', v_built)::text;
  end if;
  update heater_units set
    unit = v_plan->>'unit', coverage = v_plan->>'coverage',
    glazing_width = (v_plan->>'glazingWidth')::float8, glazing_height = (v_plan->>'glazingHeight')::float8,
    manifold_height = (v_plan->>'manifoldHeight')::float8, can_diameter = (v_plan->>'canDiameter')::float8,
    can_length = (v_plan->>'canLength')::float8, edge_clearance = (v_plan->>'edgeClearance')::float8,
    holes_per_can = (v_plan->>'holesPerCan')::int,
    frame_allowance_width = (v_plan->>'frameAllowanceWidth')::float8, frame_allowance_height = (v_plan->>'frameAllowanceHeight')::float8,
    columns = (v_plan->>'columns')::int, rows = (v_plan->>'rows')::int, cans = v_cans
  where id = v_unit.id;
  return jsonb_build_object('cans', v_cans, 'was', v_unit.cans);
end
$$;
