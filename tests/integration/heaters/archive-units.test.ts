import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { driveTarget } from "@/lib/drives/progress";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// Issue 16: a throwaway heater unit raised a drive's target for good. Archiving
// a unit gives its unbuilt claims back through the ledger (a release line, the
// claim line stays), and the unit stops counting toward the target (PRODUCT.md
// computation 2: target = Σ unit cans + spare). Restoring brings it back.
let g: FreshGroup;
let org: ApiClient;
let bld: ApiClient;

type Heater = { id: string; claimed: number; builtIn: number; archived: boolean };
type PublicDrive = { target: { cans: number; heaters: number } };
type Stock = { claimed: number; unclaimed: number };

beforeAll(async () => {
  g = await freshGroup("archive");
  [org, bld] = await Promise.all([g.client("organiser"), g.client("builder")]);
  const vol = await g.client("volunteer");
  await haulAndSort(vol, g.driveId, g.dropPointIds[0], 600);
  // Cans are built in from the punched stage.
  expect((await vol.json("POST", `/api/drives/${g.driveId}/processing`, { from: "good", to: "punched", quantity: 300 })).status).toBe(201);
});
afterAll(closeTestDb);

const post = (c: ApiClient, path: string, body: unknown = {}) => c.json<{ released?: number; error?: { code: string } }>("POST", path, body, { "Idempotency-Key": randomUUID() });
const publicTarget = async () => (await org.json<PublicDrive>("GET", `/api/public/drives/${g.driveSlug}`)).body.target;
const stock = async () => (await org.json<Stock>("GET", `/api/drives/${g.driveId}/stock`)).body;
const ledgerLineCount = async () => Number((await testDb()("ledger_lines").where({ drive_id: g.driveId }).count<{ count: string }[]>("* as count"))[0].count);
const csvLines = async () => (await (await org.get(`/api/ledger/export?driveId=${g.driveId}`)).text()).trim().split(/\r?\n/);

describe("archiving a heater unit", () => {
  it("releases its claims through the ledger, drops it from the target and the list, and restores", async () => {
    const [a, b] = g.heaterIds;
    expect((await post(bld, `/api/heaters/${a}/claims`, { quantity: 100 })).status).toBe(201);
    // Both 132-can units count before (the expected target comes from the pure computation, not from the server).
    expect(await publicTarget()).toEqual({ cans: driveTarget([132, 132]).cans, heaters: 2 });
    const before = { stock: await stock(), lines: await ledgerLineCount(), csv: await csvLines() };
    expect(before.stock.claimed).toBe(100);

    const archived = await post(org, `/api/heaters/${a}/archive`);
    expect(archived.status).toBe(200);
    expect(archived.body.released).toBe(100);

    expect(await publicTarget()).toEqual({ cans: driveTarget([132]).cans, heaters: 1 });
    const after = await stock();
    expect(after.claimed).toBe(0);
    expect(after.unclaimed).toBe(before.stock.unclaimed + 100);
    // Nothing logged disappears: the claim line stays and one release line is added, in the table and in the CSV.
    expect(await ledgerLineCount()).toBe(before.lines + 1);
    const csv = await csvLines();
    expect(csv.length).toBe(before.csv.length + 1);
    for (const line of before.csv) expect(csv).toContain(line);

    const active = (await org.json<Heater[]>("GET", "/api/heaters")).body.map((h) => h.id);
    expect(active).toContain(b);
    expect(active).not.toContain(a);
    const shelf = (await org.json<Heater[]>("GET", "/api/heaters?archived=1")).body;
    expect(shelf.map((h) => [h.id, h.archived])).toEqual([[a, true]]);
    expect((await org.json("GET", "/api/heaters?archived=yes")).status).toBe(422);

    // State rules: no claims on an archived unit, no second archive, and the release stays after a restore.
    expect((await post(bld, `/api/heaters/${a}/claims`, { quantity: 1 })).status).toBe(409);
    expect((await post(org, `/api/heaters/${a}/archive`)).status).toBe(409);
    expect((await post(org, `/api/heaters/${b}/restore`)).status).toBe(409);
    expect((await post(org, `/api/heaters/${a}/restore`)).status).toBe(200);
    expect(await publicTarget()).toEqual({ cans: driveTarget([132, 132]).cans, heaters: 2 });
    expect((await stock()).claimed).toBe(0);
    expect(await ledgerLineCount()).toBe(before.lines + 1);
  });

  it("refuses (409) to archive a unit with cans built in, and changes nothing", async () => {
    const b = g.heaterIds[1];
    expect((await post(bld, `/api/heaters/${b}/claims`, { quantity: 30 })).status).toBe(201);
    expect((await post(bld, `/api/heaters/${b}/built-in`, { quantity: 10 })).status).toBe(201);
    const lines = await ledgerLineCount();
    const refused = await post(bld, `/api/heaters/${b}/archive`);
    expect(refused.status).toBe(409);
    expect(refused.body.error?.code).toBe("conflict");
    expect(await ledgerLineCount()).toBe(lines);
    const unit = (await org.json<Heater[]>("GET", "/api/heaters")).body.find((h) => h.id === b)!;
    expect(unit).toMatchObject({ claimed: 20, builtIn: 10, archived: false });
  });

  it("is 404 for another group's organiser, who changes nothing", async () => {
    const other = await (await freshGroup("archive-other")).client("organiser");
    const a = g.heaterIds[0];
    expect((await post(other, `/api/heaters/${a}/archive`)).status).toBe(404);
    expect((await testDb()("heater_units").where({ id: a }).first("archived_at")).archived_at).toBeNull();
  });
});
