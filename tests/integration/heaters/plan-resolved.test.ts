import path from "node:path";
import knex, { type Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { knexConfig } from "@/knexfile";
import { computeCanGrid, type CanGridResult } from "@/lib/heaters/can-grid";
import { fromMm, toMm, type CanGridInput, type LengthUnit } from "@/lib/heaters/grid-input";
import { adminQuery, databaseUrl, type TestDb } from "@/tests/support/db";

// Migration 20261218010000: saved heater units stop leaving the can size,
// manifold height, clearance and frame allowances NULL for the read path to
// default. Units saved the old way are migrated in a database of this file's
// own; the app's read path (getHeaterUnit, planOf, computeCanGrid, listDriveTargets)
// then runs against it and must give every unit the same grid and every drive
// the same target as before. Units saved since: plan-stored.test.ts.
const root = path.resolve(import.meta.dirname, "../../..");
const MIGRATION = "20261218010000_heater_plan_resolved.ts";
const name = `plan_resolved_${Date.now()}`;
const url = databaseUrl(name);
const PLAN_COLUMNS = ["manifold_height", "can_diameter", "can_length", "edge_clearance", "frame_allowance_width", "frame_allowance_height"] as const;

type OldRow = {
  unit: LengthUnit;
  coverage: "chamber" | "full";
  glazing_width: number;
  glazing_height: number;
  manifold_height: number | null;
  can_diameter: number | null;
  can_length: number | null;
  edge_clearance: number | null;
  holes_per_can: number;
  frame_allowance_width: number | null;
  frame_allowance_height: number | null;
};

/**
 * The read path as it was before this change (planOf in lib/heaters/queries.ts at the
 * previous commit): NULLs became "not given", and computeCanGrid filled in the defaults
 * in the unit the page reads in.
 */
function oldPlan(r: OldRow, unit: LengthUnit): CanGridInput {
  const len = (v: number) => (unit === r.unit ? v : fromMm(toMm(v, r.unit), unit));
  const opt = (v: number | null) => (v === null ? undefined : len(v));
  return {
    glazingWidth: len(r.glazing_width),
    glazingHeight: len(r.glazing_height),
    unit,
    coverage: r.coverage,
    manifoldHeight: opt(r.manifold_height),
    canDiameter: opt(r.can_diameter),
    canLength: opt(r.can_length),
    edgeClearance: opt(r.edge_clearance),
    holesPerCan: r.holes_per_can,
    frameAllowanceWidth: opt(r.frame_allowance_width),
    frameAllowanceHeight: opt(r.frame_allowance_height),
  };
}

const NULLS = Object.fromEntries(PLAN_COLUMNS.map((c) => [c, null])) as Record<(typeof PLAN_COLUMNS)[number], null>;
// Units as the app and the demo seed saved them before: blanks stayed NULL.
const OLD_UNITS: (OldRow & { name: string })[] = [
  { name: "mm, chamber, all blank", unit: "mm", coverage: "chamber", glazing_width: 900, glazing_height: 1800, holes_per_can: 4, ...NULLS },
  { name: "mm, full, all blank", unit: "mm", coverage: "full", glazing_width: 1000, glazing_height: 2000, holes_per_can: 4, ...NULLS },
  { name: "in, chamber, all blank", unit: "in", coverage: "chamber", glazing_width: 30, glazing_height: 60, holes_per_can: 4, ...NULLS },
  { name: "in, full, manifold given", unit: "in", coverage: "full", glazing_width: 28, glazing_height: 74, holes_per_can: 4, ...NULLS, manifold_height: 5 },
  // Exactly 11 default cans across and 7 up, in inches: a hair less in a default would drop a column and a row.
  { name: "in, exact fit", unit: "in", coverage: "chamber", glazing_width: (11 * 66) / 25.4, glazing_height: (7 * 122) / 25.4, holes_per_can: 6, ...NULLS },
  {
    name: "mm, every value given",
    unit: "mm",
    coverage: "full",
    glazing_width: 800,
    glazing_height: 1600,
    holes_per_can: 3,
    manifold_height: 90,
    can_diameter: 70,
    can_length: 115,
    edge_clearance: 12,
    frame_allowance_width: 40,
    frame_allowance_height: 60,
  },
];

let mine: TestDb; // untyped rows: it writes the old shape, NULLs and all
const ids = { group: "", drive: "", units: [] as string[] };
type Lib = {
  getHeaterUnit: typeof import("@/lib/heaters/queries").getHeaterUnit;
  planOf: typeof import("@/lib/heaters/queries").planOf;
  listDriveTargets: typeof import("@/lib/heaters/drive-targets").listDriveTargets;
  db: Knex;
};
let lib: Lib;
const saved = { DATABASE_URL: process.env.DATABASE_URL, READ_CACHE_MS: process.env.READ_CACHE_MS, DATABASE_READ_URL: process.env.DATABASE_READ_URL };

/** Every migration before this one. */
async function migrateToJustBefore(db: Knex) {
  const config = { directory: path.join(root, "db/migrations") };
  for (;;) {
    const [, pending] = (await db.migrate.list(config)) as [unknown[], { file: string }[]];
    if (!pending.length) throw new Error(`${MIGRATION} not found among the migrations`);
    if (pending[0].file === MIGRATION) return;
    await db.migrate.up(config);
  }
}

/** The app's query modules against this file's database (lib/db.ts builds its one Knex from DATABASE_URL on first import). */
async function loadLib(): Promise<Lib> {
  process.env.DATABASE_URL = url;
  process.env.READ_CACHE_MS = "0";
  delete process.env.DATABASE_READ_URL;
  delete (globalThis as { cantroveDb?: Knex }).cantroveDb;
  const [queries, targets, dbm] = await Promise.all([import("@/lib/heaters/queries"), import("@/lib/heaters/drive-targets"), import("@/lib/db")]);
  return { getHeaterUnit: queries.getHeaterUnit, planOf: queries.planOf, listDriveTargets: targets.listDriveTargets, db: dbm.db };
}

beforeAll(async () => {
  await adminQuery(`create database "${name}"`);
  mine = knex(knexConfig(url)) as TestDb;
  await migrateToJustBefore(mine);
  const [group] = await mine("groups").insert({ slug: `g-${name}`, name: "Plan migration group" }).returning("id");
  const [drive] = await mine("drives")
    .insert({ group_id: group.id, slug: `d-${name}`, name: "Plan migration drive", starts_on: "2026-12-01", ends_on: "2027-02-28", spare_percent: 7 })
    .returning("id");
  ids.group = group.id;
  ids.drive = drive.id;
  for (const u of OLD_UNITS) {
    // The counts as the app stored them: computed from the plan with the defaults filled in.
    const grid = computeCanGrid(oldPlan(u, u.unit));
    const [row] = await mine("heater_units")
      .insert({ ...u, group_id: group.id, drive_id: drive.id, columns: grid.columns, rows: grid.rows, cans: grid.cans })
      .returning("id");
    ids.units.push(row.id);
  }
  lib = await loadLib();
}, 120_000);

afterAll(async () => {
  await lib?.db.destroy();
  delete (globalThis as { cantroveDb?: Knex }).cantroveDb;
  Object.assign(process.env, saved);
  await mine?.destroy();
  await adminQuery(`drop database if exists "${name}" with (force)`);
});

const counts = (g: CanGridResult) => ({ columns: g.columns, rows: g.rows, cans: g.cans, holes: g.holes });

describe("migration 20261218010000: saved plans keep the values they resolved to", () => {
  it("fills every blank with what the read path gave it, so no unit's grid and no drive's target changes", async () => {
    const before = await Promise.all(
      ids.units.map(async (id) => {
        const row: OldRow & { cans: number; columns: number; rows: number } = await mine("heater_units").where({ id }).first();
        return { row, mm: computeCanGrid(oldPlan(row, "mm")), in: computeCanGrid(oldPlan(row, "in")) };
      }),
    );
    const targetBefore = await lib.listDriveTargets(ids.group, ids.drive);
    expect(targetBefore[0].target.cans).toBeGreaterThan(0);
    // Some unit really has blanks, and the exact-fit unit is counted as 11 × 7.
    expect(before.some((b) => b.row.can_diameter === null)).toBe(true);
    expect(before[4].row.cans).toBe(77);

    // This migration and any after it (the app's code below expects the latest schema).
    await mine.migrate.latest({ directory: path.join(root, "db/migrations") });
    const [done] = (await mine.migrate.list({ directory: path.join(root, "db/migrations") })) as [{ name: string }[], unknown[]];
    expect(done.map((m) => m.name)).toContain(MIGRATION);

    for (const [i, id] of ids.units.entries()) {
      const b = before[i];
      const after = await lib.getHeaterUnit(ids.group, id);
      // Stored counts untouched.
      expect({ cans: after.cans, columns: after.columns, rows: after.rows }).toEqual({ cans: b.row.cans, columns: b.row.columns, rows: b.row.rows });
      // Every plan length is stored now, and it is what the old read resolved it to in the unit it was saved in.
      const resolvedBefore = computeCanGrid(oldPlan(b.row, b.row.unit));
      const asSaved = lib.planOf(after);
      for (const [column, field] of [
        ["manifold_height", "manifoldHeight"],
        ["can_diameter", "canDiameter"],
        ["can_length", "canLength"],
        ["edge_clearance", "edgeClearance"],
        ["frame_allowance_width", "frameAllowanceWidth"],
        ["frame_allowance_height", "frameAllowanceHeight"],
      ] as const) {
        expect(after[field], `${b.row.unit} unit, ${column}`).not.toBeNull();
        if (b.row[column] !== null) expect(after[field]).toBe(b.row[column]);
      }
      expect(counts(computeCanGrid(asSaved))).toEqual(counts(resolvedBefore));
      // The pages read a plan in the group's unit: the same grid in either.
      for (const unit of ["mm", "in"] as const) {
        const grid = computeCanGrid(lib.planOf(after, unit));
        expect(counts(grid), `${after.name} read in ${unit}`).toEqual(counts(b[unit]));
        expect(grid.outerSize.width).toBeCloseTo(b[unit].outerSize.width, 9);
        expect(grid.outerSize.height).toBeCloseTo(b[unit].outerSize.height, 9);
        expect(grid.slack.width).toBeCloseTo(b[unit].slack.width, 9);
        expect(grid.slack.height).toBeCloseTo(b[unit].slack.height, 9);
      }
    }
    // The blanks of an inch plan hold the millimetre defaults in inches (66 mm can: 66 / 25.4 in).
    const inch = await lib.getHeaterUnit(ids.group, ids.units[2]);
    expect(inch.canDiameter).toBe(66 / 25.4);
    expect(inch.canLength).toBe(122 / 25.4);
    expect(inch.manifoldHeight).toBe(127 / 25.4);
    const metric = await lib.getHeaterUnit(ids.group, ids.units[0]);
    expect([metric.canDiameter, metric.canLength, metric.manifoldHeight, metric.edgeClearance, metric.frameAllowanceWidth]).toEqual([66, 122, 127, 0, 0]);

    expect(await lib.listDriveTargets(ids.group, ids.drive)).toEqual(targetBefore);
  });

  it("refuses a unit saved with a blank afterwards", async () => {
    const row = { ...OLD_UNITS[0], group_id: ids.group, drive_id: ids.drive, columns: 13, rows: 14, cans: 182 };
    await expect(mine("heater_units").insert(row)).rejects.toMatchObject({ code: "23502" });
  });
});
