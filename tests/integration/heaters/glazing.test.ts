import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { driveTarget } from "@/lib/drives/progress";
import { testDb } from "@/tests/support/db";
import { freshGroupForFile, haulAndSort } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// Issue 16: a unit's glazing can change; its cans are recomputed on the server
// and the drive's target follows (PRODUCT.md computation 2: Σ unit cans + spare),
// but never below what is already claimed or built into the unit (409).
const g = freshGroupForFile("glazing");
const other = freshGroupForFile("glazing-other");
let org: ApiClient;
let bld: ApiClient;
let attacker: ApiClient;

type Unit = { id: string; cans: number; was: number; error?: { code: string; message: string } };

beforeAll(async () => {
  [org, bld, attacker] = await Promise.all([g.client("organiser"), g.client("builder"), other.client("organiser")]);
  await haulAndSort(await g.client("volunteer"), g.driveId, g.dropPointIds[0], 400);
});

const glaze = (c: ApiClient, id: string, plan: Record<string, unknown>) => c.json<Unit>("POST", `/api/heaters/${id}/glazing`, { plan }, { "Idempotency-Key": randomUUID() });
const target = async () => (await org.json<{ target: { cans: number } }>("GET", `/api/public/drives/${g.driveSlug}`)).body.target.cans;
const unitRow = (id: string) => testDb()("heater_units").where({ id }).first("cans", "columns", "rows", "glazing_width", "glazing_height");

// The can grid worked by hand from PRODUCT.md computation 1 with its stated defaults
// (can diameter 66 mm, can length 122 mm, no edge clearance, chamber coverage):
// 860 mm wide → floor(860 / 66) = 13 columns; 1500 mm high → floor(1500 / 122) = 12 rows; 156 cans.
const WIDER = { glazingWidth: 860, glazingHeight: 1500, unit: "mm", coverage: "chamber" };
const WIDER_CANS = 13 * 12;
// 400 × 600 mm → floor(400 / 66) = 6 columns, floor(600 / 122) = 4 rows: 24 cans.
const SMALL = { glazingWidth: 400, glazingHeight: 600, unit: "mm", coverage: "chamber" };
const SMALL_CANS = 6 * 4;

describe("changing a unit's glazing", () => {
  it("recomputes its cans and the drive's target", async () => {
    const [a] = g.heaterIds;
    expect(await target()).toBe(driveTarget([132, 132]).cans);
    const changed = await glaze(org, a, WIDER);
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ id: a, cans: WIDER_CANS, was: 132 });
    expect(await unitRow(a)).toEqual({ cans: WIDER_CANS, columns: 13, rows: 12, glazing_width: 860, glazing_height: 1500 });
    expect(await target()).toBe(driveTarget([WIDER_CANS, 132]).cans);
  });

  it("refuses (409) to go below what is already claimed, with the numbers, and changes nothing", async () => {
    const [a] = g.heaterIds;
    expect((await bld.json("POST", `/api/heaters/${a}/claims`, { quantity: 100 }, { "Idempotency-Key": randomUUID() })).status).toBe(201);
    const refused = await glaze(org, a, SMALL);
    expect(refused.status).toBe(409);
    expect(refused.body.error?.code).toBe("conflict");
    expect(refused.body.error?.message).toContain(`holds ${SMALL_CANS} cans`);
    expect(refused.body.error?.message).toContain("100 cans are already claimed");
    expect((await unitRow(a))?.cans).toBe(WIDER_CANS);
    expect(await target()).toBe(driveTarget([WIDER_CANS, 132]).cans);
    // Just enough: 100 claimed fits a 96-can grid plus its 5 % spare (⌈96 × 5 / 100⌉ = 5 → 101).
    const fits = await glaze(org, a, { glazingWidth: 530, glazingHeight: 1464, unit: "mm", coverage: "chamber" }); // 8 × 12 = 96 cans
    expect(fits.status).toBe(200);
    expect(fits.body.cans).toBe(96);
  });

  it("refuses an invalid plan (422), a builder (403) and another group's organiser (404), changing nothing", async () => {
    const [, b] = g.heaterIds;
    expect((await glaze(org, b, { glazingWidth: -5, glazingHeight: 600, unit: "mm", coverage: "chamber" })).status).toBe(422);
    expect((await org.json("POST", `/api/heaters/${b}/glazing`, { plan: WIDER, cans: 9999 })).status).toBe(422);
    // 60 mm wide holds no 66 mm can: a grid of no cans is refused on its fields.
    const empty = await glaze(org, b, { glazingWidth: 60, glazingHeight: 600, unit: "mm", coverage: "chamber" });
    expect(empty.status).toBe(422);
    expect(empty.body.error?.message).toContain("too small to hold one column and one row");
    expect((await glaze(bld, b, WIDER)).status).toBe(403);
    expect((await glaze(attacker, b, WIDER)).status).toBe(404);
    expect((await unitRow(b))?.cans).toBe(132);
  });
});

describe("a new glazing that leaves out the unit's other sizes", () => {
  it("keeps the unit's own saved can size, not the default, in mm or in inches", async () => {
    const [, b] = g.heaterIds;
    // This unit was planned for 70 mm wide cans (not the 66 mm default), stored in the unit's own length unit.
    const { unit } = await testDb()("heater_units").where({ id: b }).first("unit");
    await testDb()("heater_units").where({ id: b }).update({ can_diameter: unit === "in" ? 70 / 25.4 : 70 });
    // 860 mm wide with 70 mm cans → floor(860 / 70) = 12 columns; 1500 mm high with 122 mm cans → 12 rows: 144.
    const changed = await glaze(org, b, WIDER);
    expect(changed.status).toBe(200);
    expect(changed.body.cans).toBe(12 * 12);
    const saved = await testDb()("heater_units").where({ id: b }).first("unit", "can_diameter", "columns", "rows");
    expect(saved).toMatchObject({ unit: "mm", columns: 12, rows: 12 });
    expect(saved.can_diameter).toBeCloseTo(70, 6);
    // Sent in inches (33.86 in = 860 mm, 59.06 in = 1500 mm; 25.4 mm per inch exactly, NIST SP 811 B.8): the same grid.
    const inches = await glaze(org, b, { glazingWidth: 33.86, glazingHeight: 59.06, unit: "in", coverage: "chamber" });
    expect(inches.status).toBe(200);
    expect(inches.body.cans).toBe(12 * 12);
  });
});
