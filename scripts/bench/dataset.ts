import type { Knex } from "knex";

// The bench's big group, generated set-based in PostgreSQL (generate_series):
// 3 drives x 20 drop points in the demo group, hauls with weights, sorts that
// close most of them, and small processing movements that fill the ledger up
// to `lines` lines over two years. The running totals are then computed from
// the generated lines in SQL, so they agree with the ledger by construction.
export interface DatasetOptions {
  lines: number;
  hauls: number;
  drives: number;
  pointsPerDrive: number;
}

export interface Dataset {
  groupId: string;
  driveIds: string[];
  slugs: string[];
  lines: number;
}

// Larkhollow's invented centre; points sit within a few km of it.
const LAT = 52.0;
const LNG = -1.6;

export async function generateDataset(db: Knex, o: DatasetOptions): Promise<Dataset> {
  const group = await db("groups").where({ slug: "larkhollow-warm-rooms" }).first();
  if (!group) throw new Error("The bench needs the demo group: seed the demo first.");
  const user = await db("memberships as m").join("users as u", "u.id", "m.user_id").where({ "m.group_id": group.id, "m.role": "organiser" }).select("u.id").first();
  const existing = await db("drives").where("slug", "like", "bench-drive-%").orderBy("slug").select("id", "slug");
  if (existing.length === o.drives) {
    const n = await db("ledger_lines").whereIn("drive_id", existing.map((d) => d.id)).count({ n: "*" }).first();
    if (Number(n?.n) >= o.lines) return { groupId: group.id, driveIds: existing.map((d) => d.id), slugs: existing.map((d) => d.slug), lines: Number(n?.n) };
    throw new Error("The bench database holds a different dataset; delete .bench/ and run again.");
  }

  await db.transaction(async (trx) => {
    // FK checks per row would dominate a million-row load; the data is consistent by construction.
    await trx.raw("set local session_replication_role = replica");
    await trx.raw("set local synchronous_commit = off");
    const p = { g: group.id, u: user.id, D: o.drives, P: o.pointsPerDrive, H: o.hauls };
    await exec(trx,
      `create temp table bd on commit drop as
         select d as idx, gen_random_uuid() as id, 'bench-drive-' || d as slug from generate_series(1, :D::int) d;
       insert into drives (id, group_id, slug, name, description, wanted, starts_on, ends_on, is_public)
         select id, :g, slug, 'Bench drive ' || idx, 'A big drive for the benchmark.', 'Clean aluminium drink cans.',
                (now() - interval '730 days')::date, (now() + interval '30 days')::date, true from bd;
       create temp table bp on commit drop as
         select d.idx as drive_idx, d.id as drive_id, p as idx, gen_random_uuid() as id from bd d, generate_series(1, :P::int) p;
       insert into drop_points (id, group_id, drive_id, name, address, lat, lng, hours, capacity_bags)
         select id, :g, drive_id, 'Bench point ' || drive_idx || '-' || idx, idx || ' Bench Row, Larkhollow',
                ${LAT} + (idx % 7) * 0.004 - drive_idx * 0.002, ${LNG} + (idx / 7) * 0.005, 'Mon-Sat 9-17', 8 from bp;`,
      p,
    );
    // Hauls: spread over two years, round-robin over drives and points.
    await exec(trx,
      `create temp table bh on commit drop as
         select i, gen_random_uuid() as id, gen_random_uuid() as movement_id, d.id as drive_id, pt.id as drop_point_id,
                1 + i % 4 as bags, round(((1 + i % 4) * 2.5 + (i % 7) * 0.3)::numeric, 3) as weight_kg,
                now() - interval '730 days' + (i::float / :H) * interval '728 days' as at
         from generate_series(0, :H::int - 1) i
         join bd d on d.idx = 1 + i % :D::int
         join bp pt on pt.drive_id = d.id and pt.idx = 1 + (i / :D::int) % :P::int;
       insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, recorded_at)
         select movement_id, :g, drive_id, 'haul', :u, at, at from bh;
       insert into hauls (id, group_id, drive_id, drop_point_id, movement_id, bags, weight_kg, estimated_cans, estimate_method, estimate_per_unit, hauled_at, recorded_at, recorded_by)
         select id, :g, drive_id, drop_point_id, movement_id, bags, weight_kg, round(weight_kg * 1000 / 15)::int, 'weight', 1000.0 / 15, at, at, :u from bh;
       insert into ledger_lines (movement_id, group_id, drive_id, drop_point_id, from_stage, to_stage, quantity, is_estimate, occurred_at, recorded_at, recorded_by, haul_id)
         select movement_id, :g, drive_id, drop_point_id, null, 'hauled', round(weight_kg * 1000 / 15)::int, true, at, at, :u, id from bh;`,
      p,
    );
    // Sorts: nine hauls in ten are counted, three hauls of one drive per sort, 90 % good.
    await exec(trx,
      `create temp table bs on commit drop as
         select (i / (3 * :D::int)) * :D::int + i % :D::int as s, h.*, round(h.weight_kg * 1000 / 15)::int as est
         from bh h where i < (:H::int * 9 / 10) and i < :H::int - :H::int % (3 * :D::int);
       create temp table bss on commit drop as
         select s, min(drive_id::text)::uuid as drive_id, gen_random_uuid() as id, gen_random_uuid() as movement_id,
                sum((est * 9) / 10)::int as good, sum(est - (est * 9) / 10)::int as rejected, count(*)::int as n,
                sum(bags)::int as bags, sum(weight_kg) as weight_kg, max(at) + interval '1 day' as at
         from bs group by s;
       insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, recorded_at)
         select movement_id, :g, drive_id, 'sort', :u, at, at from bss;
       insert into sorts (id, group_id, drive_id, movement_id, good, rejected, counted, haul_count, bags, weight_kg, sorted_at, recorded_at, recorded_by)
         select id, :g, drive_id, movement_id, good, jsonb_build_object('dented', rejected), good + rejected, n, bags, weight_kg, at, at, :u from bss;
       update hauls h set sort_id = ss.id from bs join bss ss using (s) where h.id = bs.id;
       insert into ledger_lines (movement_id, group_id, drive_id, drop_point_id, from_stage, to_stage, quantity, reason, is_estimate, occurred_at, recorded_at, recorded_by, haul_id, sort_id)
         select ss.movement_id, :g, b.drive_id, b.drop_point_id, x.f, x.t, x.q, x.r, x.e, ss.at, ss.at, :u, b.id, ss.id
         from bs b join bss ss using (s)
         cross join lateral (values ('hauled', null, b.est, null, true),
                                    (null, 'good', (b.est * 9) / 10, null, false),
                                    (null, 'rejected', b.est - (b.est * 9) / 10, 'dented', false)) x(f, t, q, r, e)
         where x.q > 0;`,
      p,
    );
    const row = await trx("ledger_lines").whereIn("drive_id", trx("bd").select("id")).count({ n: "*" }).first();
    const rest = Math.max(0, o.lines - Number(row?.n ?? 0));
    // Processing: one can a line, good -> washed -> opened -> punched in turn, so no stage runs negative.
    await exec(trx,
      `create temp table bk on commit drop as
         select k, md5('bench-processing-' || k)::uuid as movement_id, d.id as drive_id,
                (array['good','washed','opened'])[1 + (k / :D::int) % 3] as f,
                (array['washed','opened','punched'])[1 + (k / :D::int) % 3] as t,
                now() - interval '720 days' + (k::float / greatest(:R::int, 1)) * interval '720 days' as at
         from generate_series(0, :R::int - 1) k join bd d on d.idx = 1 + k % :D::int;
       insert into movements (id, group_id, drive_id, kind, recorded_by, occurred_at, recorded_at, details)
         select movement_id, :g, drive_id, 'processing', :u, at, at, jsonb_build_object('from', f, 'to', t) from bk;
       insert into ledger_lines (movement_id, group_id, drive_id, from_stage, to_stage, quantity, occurred_at, recorded_at, recorded_by)
         select movement_id, :g, drive_id, f, t, 1, at, at, :u from bk;`,
      { ...p, R: rest },
    );
    await recomputeTotals(trx);
  });
  // Vacuum too: a million fresh rows would otherwise wake autovacuum in the middle of the measurements.
  await db.raw("vacuum analyze");
  const drives = await db("drives").where("slug", "like", "bench-drive-%").orderBy("slug").select("id", "slug");
  const n = await db("ledger_lines").whereIn("drive_id", drives.map((d) => d.id)).count({ n: "*" }).first();
  return { groupId: group.id, driveIds: drives.map((d) => d.id), slugs: drives.map((d) => d.slug), lines: Number(n?.n) };
}

/** The running totals of the drives in the temp table bd (their drop points in bp), computed from their ledger lines. */
export async function recomputeTotals(trx: Knex.Transaction): Promise<void> {
  await exec(trx, `
    insert into stage_balances (group_id, drive_id, drop_point_id, heater_unit_id, stage, quantity)
      select group_id, drive_id, null, null, stage, sum(q) from (
        select group_id, drive_id, to_stage as stage, quantity as q from ledger_lines where drive_id in (select id from bd) and to_stage is not null
        union all
        select group_id, drive_id, from_stage, -quantity from ledger_lines where drive_id in (select id from bd) and from_stage is not null
      ) m group by group_id, drive_id, stage;
    insert into stage_balances (group_id, drive_id, drop_point_id, heater_unit_id, stage, quantity)
      select group_id, drive_id, drop_point_id, null, 'hauled',
             sum(case when to_stage = 'hauled' then quantity else -quantity end)
      from ledger_lines where drive_id in (select id from bd) and drop_point_id is not null and 'hauled' in (from_stage, to_stage)
      group by group_id, drive_id, drop_point_id;
    insert into reject_tallies (group_id, drive_id, drop_point_id, reason, quantity)
      select group_id, drive_id, dp, reason, sum(q) from (
        select group_id, drive_id, dp, reason, case when to_stage = 'rejected' then quantity else -quantity end as q
        from ledger_lines cross join lateral (values (null::uuid), (drop_point_id)) v(dp)
        where drive_id in (select id from bd) and ((to_stage = 'rejected' and from_stage is null) or (from_stage = 'rejected' and to_stage is null))
          and (v.dp is null or drop_point_id is not null)
      ) r group by group_id, drive_id, dp, reason;
    insert into drop_point_tallies (drop_point_id, group_id, drive_id, hauls, bags, good_cans, rejected_cans)
      select p.id, (select group_id from drives where id = p.drive_id), p.drive_id,
             (select count(*) from hauls h where h.drop_point_id = p.id and h.reversed_at is null),
             (select coalesce(sum(bags), 0) from hauls h where h.drop_point_id = p.id and h.reversed_at is null),
             (select coalesce(sum(case when to_stage = 'good' then quantity else -quantity end), 0) from ledger_lines l
               where l.drop_point_id = p.id and ((to_stage = 'good' and from_stage is null) or (from_stage = 'good' and to_stage is null))),
             (select coalesce(sum(case when to_stage = 'rejected' then quantity else -quantity end), 0) from ledger_lines l
               where l.drop_point_id = p.id and ((to_stage = 'rejected' and from_stage is null) or (from_stage = 'rejected' and to_stage is null)))
      from bp p;
    insert into drive_daily_good (drive_id, day, good_cans)
      select drive_id, (occurred_at at time zone 'UTC')::date, sum(case when to_stage = 'good' then quantity else -quantity end)
      from ledger_lines where drive_id in (select id from bd) and ((to_stage = 'good' and from_stage is null) or (from_stage = 'good' and to_stage is null))
      group by 1, 2;
  `, {});
}

/** pg refuses several statements in one parameterised query, so run them one by one. */
export async function exec(trx: Knex.Transaction, sql: string, bindings: Record<string, unknown>): Promise<void> {
  for (const statement of sql.split(/;\s*\n/).map((x) => x.trim().replace(/;$/, "")).filter(Boolean)) {
    const used = Object.fromEntries(Object.entries(bindings).filter(([k]) => new RegExp(`:${k}\\b`).test(statement)));
    await trx.raw(statement, used as Knex.ValueDict);
  }
}

/** Differences between the drive-level running totals and the sums of the ledger (empty when they agree). */
export async function balanceErrors(db: Knex, driveIds: string[]): Promise<{ driveId: string; stage: string; totals: number; ledger: number }[]> {
  const { rows } = await db.raw(
    `with ledger as (
       select drive_id, stage, sum(q) as q from (
         select drive_id, to_stage as stage, quantity as q from ledger_lines where drive_id = any(?) and to_stage is not null
         union all select drive_id, from_stage, -quantity from ledger_lines where drive_id = any(?) and from_stage is not null) m
       group by drive_id, stage),
     totals as (select drive_id, stage, quantity as q from stage_balances where drive_id = any(?) and drop_point_id is null and heater_unit_id is null)
     select coalesce(l.drive_id, t.drive_id) as drive_id, coalesce(l.stage, t.stage) as stage, coalesce(t.q, 0) as totals, coalesce(l.q, 0) as ledger
     from ledger l full join totals t on t.drive_id = l.drive_id and t.stage = l.stage
     where coalesce(t.q, 0) <> coalesce(l.q, 0)`,
    [driveIds, driveIds, driveIds],
  );
  return (rows as { drive_id: string; stage: string; totals: string; ledger: string }[]).map((r) => ({
    driveId: r.drive_id,
    stage: r.stage,
    totals: Number(r.totals),
    ledger: Number(r.ledger),
  }));
}
