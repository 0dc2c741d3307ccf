import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";
import { totalsMismatches } from "@/tests/support/ledger-totals";
import type { ApiClient } from "@/tests/support/http";

type Stock = { stages: Record<string, number>; claimed: number; unclaimed: number };

let g: FreshGroup;
let vol: ApiClient;
let bld: ApiClient;
beforeAll(async () => {
  g = await freshGroup("race");
  [vol, bld] = await Promise.all([g.client("volunteer"), g.client("builder")]);
  await haulAndSort(vol, g.driveId, g.dropPointIds[0], 1000);
  // Units of 600 cans (need 630 each with the 5 % spare): the drive's 1000 cans, not the units' need, is the limit here.
  await testDb()("heater_units").whereIn("id", g.heaterIds).update({ columns: 25, rows: 24, cans: 600 });
});
afterAll(closeTestDb);


describe("many writers at once", () => {
  it("50 concurrent processing requests: exactly those that fit succeed, the rest are 409", async () => {
    // 50 × 30 = 1500 asked of 1000 good cans: 33 fit (990), 17 cannot.
    const results = await Promise.all(
      Array.from({ length: 50 }, () =>
        vol.json<{ error?: { message: string } }>("POST", `/api/drives/${g.driveId}/processing`, { from: "good", to: "washed", quantity: 30 }, { "idempotency-key": randomUUID() }),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(33);
    expect(statuses.filter((s) => s === 409)).toHaveLength(17);
    expect(results.find((r) => r.status === 409)?.body.error?.message).toMatch(/only 10 left/);
    const stock = (await vol.json<Stock>("GET", `/api/drives/${g.driveId}/stock`)).body;
    expect(stock.stages.good).toBe(10);
    expect(stock.stages.washed).toBe(990);
    // A race cannot leave a balance negative (a CHECK refuses it); it could leave a total apart from its lines.
    expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
  });

  it("40 concurrent claims beyond the unclaimed cans: exactly those that fit succeed", async () => {
    // 1000 processed cans, none claimed; 40 × 30 = 1200 asked: 33 fit (990).
    const results = await Promise.all(
      Array.from({ length: 40 }, (_, i) =>
        bld.json("POST", `/api/heaters/${g.heaterIds[i % 2]}/claims`, { quantity: 30 }, { "idempotency-key": randomUUID() }),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(33);
    expect(statuses.filter((s) => s === 409)).toHaveLength(7);
    const stock = (await bld.json<Stock>("GET", `/api/drives/${g.driveId}/stock`)).body;
    expect(stock.claimed).toBe(990);
    expect(stock.unclaimed).toBe(10);
    const heaters = (await bld.json<{ id: string; claimed: number }[]>("GET", "/api/heaters")).body.filter((h) => g.heaterIds.includes(h.id));
    expect(heaters.reduce((s, h) => s + h.claimed, 0)).toBe(990);
    // A race cannot leave a balance negative (a CHECK refuses it); it could leave a total apart from its lines.
    expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
  });
});
