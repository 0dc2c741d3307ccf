-- Archiving and deleting the records around a drive (issue 16: "archive, never lose").
-- Applied like ledger_post.sql (DEVELOPERS.md "Adding a migration").

-- Stamps or clears archived_at on one row of v_table that belongs to v_group, under a row lock.
-- Refuses CT404 (not the group's), CT409 alreadyArchived / notArchived. Shared by
-- heater_unit_archive and record_archive, so every archive obeys one rule.
create or replace function archive_stamp(v_table text, v_id uuid, v_group uuid, v_archive boolean) returns void language plpgsql as $$
declare
  v_at timestamptz;
  v_rows int;
begin
  execute format('select archived_at from %I where id = $1 and group_id = $2 for no key update', v_table) into v_at using v_id, v_group;
  get diagnostics v_rows = row_count;
  if v_rows = 0 then
    raise exception 'archive_stamp: no such % row', v_table using errcode = 'CT404', detail = jsonb_build_object('what', v_table)::text;
  end if;
  if v_archive and v_at is not null then
    raise exception 'archive_stamp: already archived' using errcode = 'CT409', detail = '{"kind":"alreadyArchived"}';
  end if;
  if not v_archive and v_at is null then
    raise exception 'archive_stamp: not archived' using errcode = 'CT409', detail = '{"kind":"notArchived"}';
  end if;
  execute format('update %I set archived_at = $1 where id = $2', v_table) using case when v_archive then now() end, v_id;
end
$$;

-- The table of one kind of record (the kinds of lib/records/kinds.ts).
create or replace function record_table(v_kind text) returns text language sql immutable as $$
  select case v_kind when 'drive' then 'drives' when 'dropPoint' then 'drop_points' when 'photo' then 'files'
    when 'pledge' then 'pledges' when 'fillReport' then 'fill_reports' end
$$;

-- p = { groupId, kind, id, archive }.
create or replace function record_archive(p jsonb) returns jsonb language plpgsql as $$
begin
  perform archive_stamp(record_table(p->>'kind'), (p->>'id')::uuid, (p->>'groupId')::uuid, (p->>'archive')::boolean);
  return jsonb_build_object('archived', (p->>'archive')::boolean);
end
$$;

-- Deletes one record that no ledger line refers to (p = { groupId, kind, id }). A drive or a drop point
-- locks its drive first (the order every ledger writer uses), so no haul or movement can arrive between
-- the check and the delete; either is refused (CT409 referenced, with what refers to it) while the ledger
-- or a pickup run names it (a drive's runs would go with it; runs keep their own history). Photos, pledges and fill reports carry no ledger line. Answers the photo keys
-- the caller removes from the upload host after the commit.
create or replace function record_delete(p jsonb) returns jsonb language plpgsql as $$
declare
  v_group uuid := (p->>'groupId')::uuid;
  v_kind text := p->>'kind';
  v_id uuid := (p->>'id')::uuid;
  v_drive uuid;
  v_movements bigint := 0;
  v_stops bigint := 0;
  v_keys jsonb := '[]'::jsonb;
  v_gone int := 0;
begin
  if v_kind = 'drive' then
    perform ledger_lock_drive(v_group, v_id);
    select count(*) into v_movements from movements where drive_id = v_id;
    select count(*) into v_stops from pickup_runs where drive_id = v_id;
  elsif v_kind = 'dropPoint' then
    select drive_id into v_drive from drop_points where id = v_id and group_id = v_group;
    if not found then
      raise exception 'record_delete: no such drop point' using errcode = 'CT404', detail = '{"what":"dropPoint"}';
    end if;
    perform ledger_lock_drive(v_group, v_drive);
    select count(*) into v_movements from (
      select 1 from ledger_lines where drop_point_id = v_id union all select 1 from hauls where drop_point_id = v_id) x;
    select count(*) into v_stops from pickup_run_stops where drop_point_id = v_id;
  end if;
  if v_movements > 0 or v_stops > 0 then
    raise exception 'record_delete: referenced' using errcode = 'CT409',
      detail = jsonb_build_object('kind', 'referenced', 'ledger', v_movements, 'runStops', v_stops)::text;
  end if;
  -- Photos hang on their drop point or fill report by subject_id (no foreign key): they go with it, and
  -- their keys are answered. A drop point's fill reports go with the drop point, and so their photos.
  with gone as (
    delete from files where group_id = v_group and (
      (v_kind = 'photo' and id = v_id and purpose in ('drop-point-photo', 'fill-report-photo'))
      or (v_kind = 'fillReport' and purpose = 'fill-report-photo' and subject_id = v_id)
      or (v_kind = 'dropPoint' and purpose = 'drop-point-photo' and subject_id = v_id)
      or (v_kind = 'dropPoint' and purpose = 'fill-report-photo' and subject_id in (select id from fill_reports where drop_point_id = v_id))
      or (v_kind = 'drive' and purpose = 'drop-point-photo' and subject_id in (select id from drop_points where drive_id = v_id))
      or (v_kind = 'drive' and purpose = 'fill-report-photo' and subject_id in (
            select f.id from fill_reports f join drop_points d on d.id = f.drop_point_id where d.drive_id = v_id)))
    returning key)
  select coalesce(jsonb_agg(key), '[]'::jsonb) into v_keys from gone;
  if v_kind <> 'photo' then
    execute format('delete from %I where id = $1 and group_id = $2', record_table(v_kind)) using v_id, v_group;
    get diagnostics v_gone = row_count;
  else
    v_gone := jsonb_array_length(v_keys);
  end if;
  -- Gone already (a second delete, another group's id): nothing was deleted, and the answer says so.
  if v_gone = 0 then
    raise exception 'record_delete: no such row' using errcode = 'CT404', detail = jsonb_build_object('what', v_kind)::text;
  end if;
  return jsonb_build_object('deleted', true, 'fileKeys', v_keys);
end
$$;
