import type { Knex } from "knex";
import { exec, recomputeTotals } from "./dataset";

// The bench's other groups: `groups` invented groups beside the busy one
// (scripts/bench/dataset.ts), each with an organiser, one public drive with
// `pointsPerDrive` drop points, `hauls` hauls (nine in ten sorted, one sort a
// haul) and one-can processing lines up to `linesPerGroup` ledger lines in
// all. Generated set-based in PostgreSQL, `chunk` groups a transaction; the
// running totals are computed from the generated lines (recomputeTotals), so
// they agree with the ledger by construction.
export interface GroupsOptions {
  groups: number;
  linesPerGroup: number;
  hauls: number;
  pointsPerDrive: number;
  chunk?: number;
  log?: (line: string) => void;
}

export interface OtherGroups {
  groups: number;
  lines: number;
  /** One of them, for the "a small group's drive" checks. */
  sampleSlug: string;
}

const LAT = 52.1;
const LNG = -1.4;

export async function generateOtherGroups(db: Knex, o: GroupsOptions): Promise<OtherGroups> {
  const chunk = o.chunk ?? 100;
  const have = Number((await db("groups").where("slug", "like", "bench-group-%").count({ n: "*" }).first())?.n ?? 0);
  if (have > 0 && have !== o.groups) throw new Error("The bench database holds a different set of groups; delete .bench/ and run again.");
  if (have === 0) {
    for (let first = 1; first <= o.groups; first += chunk) {
      const last = Math.min(o.groups, first + chunk - 1);
      await db.transaction(async (trx) => {
        // FK checks per row would dominate a nine-million-row load; the data is consistent by construction.
        await trx.raw("set local session_replication_role = replica");
        await trx.raw("set local synchronous_commit = off");
        const p = { A: first, B: last, P: o.pointsPerDrive, H: o.hauls };
        await exec(trx,
          `create temp table og on commit drop as
             select g as idx, gen_random_uuid() as id, gen_random_uuid() as user_id, gen_random_uuid() as drive_id from generate_series(:A::int, :B::int) g;
           insert into groups (id, slug, name, town, time_zone, locale, units)
             select id, 'bench-group-' || idx, 'Bench group ' || idx, 'Benchton', 'Europe/London', 'en-GB', 'metric' from og;
           insert into users (id, email, name, email_verified_at)
             select user_id, 'bench-organiser-' || idx || '@cantrove.test', 'Bench organiser ' || idx, now() from og;
           insert into memberships (group_id, user_id, role) select id, user_id, 'organiser' from og;
           create temp table bd on commit drop as
             select drive_id as id, id as group_id, user_id, idx, 'bench-group-' || idx || '-drive' as slug from og;
           insert into drives (id, group_id, slug, name, description, wanted, starts_on, ends_on, is_public)
             select id, group_id, slug, 'Bench group drive ' || idx, 'A small drive for the benchmark.', 'Clean aluminium drink cans.',
                    (now() - interval '730 days')::date, (now() + interval '30 days')::date, true from bd;
           create temp table bp on commit drop as
             select d.id as drive_id, d.group_id, p as idx, gen_random_uuid() as id from bd d, generate_series(1, :P::int) p;
           insert into drop_points (id, group_id, drive_id, name, address, lat, lng, hours, capacity_bags)
             select id, group_id, drive_id, 'Bench point ' || idx, idx || ' Bench Lane, Benchton',
                    ${LAT} + (idx % 7) * 0.004, ${LNG} + (idx / 7) * 0.005, 'Mon-Sat 9-17', 8 from bp;`,
          p,
        );
        await exec(trx,
          `create temp table bh on commit drop as
             select i, d.group_id, d.user_id, d.id as drive_id, pt.id as drop_point_id, gen_random_uuid() as id, gen_random_uuid() as movement_id,
                    1 + i % 4 as bags, round(((1 + i % 4) * 2.5 + (i % 7) * 0.3)::numeric, 3) as weight_kg,
                    now() - interval '730 days' + (i::float / :H) * interval '728 days' as at
             from bd d cross join generate_series(0, :H::int - 1) i
             join bp pt on pt.drive_id = d.id and pt.idx = 1 + i % :P::int;
           insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, recorded_at)
             select movement_id, group_id, drive_id, 'haul', user_id, at, at from bh;
           insert into hauls (id, group_id, drive_id, drop_point_id, movement_id, bags, weight_kg, estimated_cans, estimate_method, estimate_per_unit, hauled_at, recorded_at, recorded_by)
             select id, group_id, drive_id, drop_point_id, movement_id, bags, weight_kg, round(weight_kg * 1000 / 15)::int, 'weight', 1000.0 / 15, at, at, user_id from bh;
           insert into ledger_lines (movement_id, group_id, drive_id, drop_point_id, from_stage, to_stage, quantity, is_estimate, occurred_at, recorded_at, recorded_by, haul_id)
             select movement_id, group_id, drive_id, drop_point_id, null, 'hauled', round(weight_kg * 1000 / 15)::int, true, at, at, user_id, id from bh;
           create temp table bs on commit drop as
             select h.*, gen_random_uuid() as sort_id, gen_random_uuid() as sort_movement_id, round(h.weight_kg * 1000 / 15)::int as est, h.at + interval '1 day' as sat
             from bh h where i % 10 <> 9;
           insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, recorded_at)
             select sort_movement_id, group_id, drive_id, 'sort', user_id, sat, sat from bs;
           insert into sorts (id, group_id, drive_id, movement_id, good, rejected, counted, haul_count, bags, weight_kg, sorted_at, recorded_at, recorded_by)
             select sort_id, group_id, drive_id, sort_movement_id, (est * 9) / 10, jsonb_build_object('dented', est - (est * 9) / 10), est, 1, bags, weight_kg, sat, sat, user_id from bs;
           update hauls h set sort_id = bs.sort_id from bs where h.id = bs.id;
           insert into ledger_lines (movement_id, group_id, drive_id, drop_point_id, from_stage, to_stage, quantity, reason, is_estimate, occurred_at, recorded_at, recorded_by, haul_id, sort_id)
             select b.sort_movement_id, b.group_id, b.drive_id, b.drop_point_id, x.f, x.t, x.q, x.r, x.e, b.sat, b.sat, b.user_id, b.id, b.sort_id
             from bs b cross join lateral (values ('hauled', null, b.est, null, true),
                                                  (null, 'good', (b.est * 9) / 10, null, false),
                                                  (null, 'rejected', b.est - (b.est * 9) / 10, 'dented', false)) x(f, t, q, r, e)
             where x.q > 0;`,
          p,
        );
        const row = await trx("ledger_lines").whereIn("drive_id", trx("bd").select("id")).count({ n: "*" }).first();
        const rest = Math.max(0, o.linesPerGroup - Math.ceil(Number(row?.n ?? 0) / (last - first + 1)));
        // Processing: one can a line, good -> washed -> opened -> punched in turn (fewer cans than the sorts counted good).
        // Movement ids rise with group and line (b<group>-…-<line>): random ids would make nine million index inserts random I/O.
        await exec(trx,
          `insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, recorded_at, details)
             select ('b' || lpad(to_hex(d.idx), 7, '0') || '-0000-4000-8000-' || lpad(to_hex(k), 12, '0'))::uuid, d.group_id, d.id, 'processing', d.user_id,
                    now() - interval '720 days' + (k::float / greatest(:R::int, 1)) * interval '720 days',
                    now() - interval '720 days' + (k::float / greatest(:R::int, 1)) * interval '720 days',
                    jsonb_build_object('from', (array['good','washed','opened'])[1 + k % 3], 'to', (array['washed','opened','punched'])[1 + k % 3])
             from bd d cross join generate_series(0, :R::int - 1) k;
           insert into ledger_lines (movement_id, group_id, drive_id, from_stage, to_stage, quantity, occurred_at, recorded_at, recorded_by)
             select ('b' || lpad(to_hex(d.idx), 7, '0') || '-0000-4000-8000-' || lpad(to_hex(k), 12, '0'))::uuid, d.group_id, d.id,
                    (array['good','washed','opened'])[1 + k % 3], (array['washed','opened','punched'])[1 + k % 3], 1,
                    now() - interval '720 days' + (k::float / greatest(:R::int, 1)) * interval '720 days',
                    now() - interval '720 days' + (k::float / greatest(:R::int, 1)) * interval '720 days', d.user_id
             from bd d cross join generate_series(0, :R::int - 1) k;`,
          { R: rest },
        );
        await recomputeTotals(trx);
      });
      o.log?.(`groups ${first}–${last} of ${o.groups} written`);
    }
    // Vacuum too: fresh rows would otherwise wake autovacuum during the measurements, and index-only scans need the visibility map.
    await db.raw("vacuum analyze");
  }
  const lines = await db.raw(`select count(*)::bigint as n from ledger_lines l join groups g on g.id = l.group_id where g.slug like 'bench-group-%'`);
  return { groups: o.groups, lines: Number(lines.rows[0].n), sampleSlug: "bench-group-1-drive" };
}
