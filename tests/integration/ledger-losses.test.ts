import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";
import { totalsMismatches } from "@/tests/support/ledger-totals";
import type { ApiClient } from "@/tests/support/http";

// Processing losses and stock counts (PRODUCT.md "Loss", "Stock count"), through
// the API: both go through ledger_post with the usual balance rules, and both undo.
type Stock = { stages: Record<string, number>; rejected: Record<string, number>; rejectedOnHand: number; claimed: number; unclaimed: number };
type Err = { error: { code: string; message: string; fields?: Record<string, string>; totals?: Record<string, number> } };

let g: FreshGroup;
let vol: ApiClient;
let org: ApiClient;
let bld: ApiClient;
const stock = async () => (await org.json<Stock>("GET", `/api/drives/${g.driveId}/stock`)).body;
const process = (body: unknown) => vol.json<{ movementId: string; lost: unknown; quantity: number } & Err>("POST", `/api/drives/${g.driveId}/processing`, body);
const count = (body: unknown, who: ApiClient = org) =>
  who.json<{ movementId: string; lines: { stage: string; expected: number; counted: number; difference: number }[] } & Err>("POST", `/api/drives/${g.driveId}/stock-counts`, body);
const daily = async () => (await testDb()("drive_daily_good").where({ drive_id: g.driveId }).select("day", "good_cans")).map((r) => `${r.day}:${r.good_cans}`).sort();

beforeAll(async () => {
  g = await freshGroup("losses");
  [vol, org, bld] = await Promise.all([g.client("volunteer"), g.client("organiser"), g.client("builder")]);
  await haulAndSort(vol, g.driveId, g.dropPointIds[0], 300, { dented: 4 });
  expect((await process({ from: "good", to: "washed", quantity: 200 })).status).toBe(201);
});
afterAll(closeTestDb);

describe("processing losses", () => {
  it("moves the lost cans from `from` to rejected with the reason, in the same movement as the step", async () => {
    const before = await stock();
    const res = await process({ from: "washed", to: "opened", quantity: 90, lost: { reason: "damagedOpening", quantity: 6 } });
    expect(res.status).toBe(201);
    expect(res.body.lost).toEqual({ reason: "damagedOpening", quantity: 6 });
    const after = await stock();
    expect(after.stages.washed).toBe(before.stages.washed - 96);
    expect(after.stages.opened).toBe(before.stages.opened + 90);
    expect(after.rejectedOnHand).toBe(before.rejectedOnHand + 6);
    expect(after.rejected.damagedOpening).toBe(6);
    expect(after.rejected.dented).toBe(4); // the contract's reasons keep their keys and values
    expect(after.unclaimed).toBe(before.unclaimed - 6);
    const lines = await testDb()("ledger_lines").where({ movement_id: res.body.movementId }).orderBy("id");
    expect(lines.map((l) => [l.from_stage, l.to_stage, l.quantity, l.reason])).toEqual([
      ["washed", "opened", 90, null],
      ["washed", "rejected", 6, "damagedOpening"],
    ]);
  });

  it("keeps the contract's processing body working, answering lost: null", async () => {
    const res = await process({ from: "opened", to: "punched", quantity: 10 });
    expect(res.status).toBe(201);
    expect(res.body.lost).toBeNull();
  });

  it("refuses a loss that takes `from` below zero, saying what is left, and writes nothing", async () => {
    const before = await stock();
    const res = await process({ from: "opened", to: "punched", quantity: before.stages.opened, lost: { reason: "damagedPunching", quantity: 1 } });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(new RegExp(`only ${before.stages.opened} left`));
    expect(await stock()).toEqual(before);
  });

  it("refuses a loss in a step the batch never reached, and an unknown reason", async () => {
    const early = await process({ from: "good", to: "washed", quantity: 5, lost: { reason: "damagedPunching", quantity: 1 } });
    expect(early.status).toBe(422);
    expect(early.body.error.fields?.["lost.reason"]).toMatch(/stops before/);
    expect((await process({ from: "good", to: "washed", quantity: 5, lost: { reason: "dented", quantity: 1 } })).status).toBe(422);
    expect((await process({ from: "good", to: "washed", quantity: 0 })).status).toBe(422);
  });

  it("records a batch that was lost whole, and undoes a loss back to where it was", async () => {
    const before = await stock();
    const res = await process({ from: "washed", to: "opened", quantity: 0, lost: { reason: "damagedWashing", quantity: 3 } });
    expect(res.status).toBe(201);
    const mid = await stock();
    expect(mid.stages.washed).toBe(before.stages.washed - 3);
    expect(mid.stages.opened).toBe(before.stages.opened);
    expect(mid.rejected.damagedWashing).toBe(3);
    const undo = await vol.json("POST", `/api/movements/${res.body.movementId}/reversal`);
    expect(undo.status).toBe(201);
    expect(await stock()).toEqual(before);
  });

  it("refuses a loss that would leave fewer cans than builders have claimed", async () => {
    const s = await stock();
    // Each unit takes only its need, so claim what both will take; the loss then eats one can past what is left unclaimed.
    const units = (await bld.json<{ id: string; remaining: number }[]>("GET", "/api/heaters")).body.filter((u) => g.heaterIds.includes(u.id));
    const claims: [string, number][] = [];
    let left = s.unclaimed;
    for (const u of units) {
      const q = Math.min(left, u.remaining);
      if (q <= 0) continue;
      expect((await bld.json("POST", `/api/heaters/${u.id}/claims`, { quantity: q })).status).toBe(201);
      claims.push([u.id, q]);
      left -= q;
    }
    expect(s.stages.good).toBeGreaterThan(left + 1);
    const res = await process({ from: "good", to: "washed", quantity: 1, lost: { reason: "damagedWashing", quantity: left + 1 } });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/unclaimed/);
    for (const [id, q] of claims) expect((await bld.json("POST", `/api/heaters/${id}/releases`, { quantity: q })).status).toBe(201);
  });
});

describe("stock counts", () => {
  it("posts the differences as one adjustment movement, leaving counted tallies alone, and undoes it", async () => {
    const before = await stock();
    const dailyBefore = await daily();
    const expected = { good: before.stages.good, washed: before.stages.washed, opened: before.stages.opened, rejected: before.rejectedOnHand };
    const res = await count({ counted: { good: expected.good - 7, washed: expected.washed + 2, opened: expected.opened, rejected: expected.rejected - 1 }, expected, reason: "Shelf recount after the wash day" });
    expect(res.status).toBe(201);
    expect(res.body.lines).toEqual([
      { stage: "good", expected: expected.good, counted: expected.good - 7, difference: -7 },
      { stage: "washed", expected: expected.washed, counted: expected.washed + 2, difference: 2 },
      { stage: "rejected", expected: expected.rejected, counted: expected.rejected - 1, difference: -1 },
    ]);
    const movements = await testDb()("movements").where({ id: res.body.movementId });
    expect(movements.map((m) => m.kind)).toEqual(["stockCount"]);
    const lines = await testDb()("ledger_lines").where({ movement_id: res.body.movementId }).orderBy("id");
    expect(lines.map((l) => [l.from_stage, l.to_stage, l.quantity, l.reason, l.note])).toEqual([
      ["good", null, 7, "stockCount", "Shelf recount after the wash day"],
      [null, "washed", 2, "stockCount", "Shelf recount after the wash day"],
      ["rejected", null, 1, "stockCount", "Shelf recount after the wash day"],
    ]);
    const after = await stock();
    expect(after.stages).toMatchObject({ good: expected.good - 7, washed: expected.washed + 2, opened: expected.opened });
    expect(after.rejectedOnHand).toBe(expected.rejected - 1);
    expect(after.rejected).toEqual(before.rejected); // rejects by reason are counted cans, not adjusted
    expect(after.unclaimed).toBe(before.unclaimed - 5);
    expect(await daily()).toEqual(dailyBefore); // the pace counts sorted cans, not adjustments

    const undo = await org.json("POST", `/api/movements/${res.body.movementId}/reversal`);
    expect(undo.status).toBe(201);
    expect(await stock()).toEqual(before);
    expect(await daily()).toEqual(dailyBefore);
  });

  it("refuses a count made against totals that moved since, with the new totals", async () => {
    const s = await stock();
    const res = await count({ counted: { washed: 1 }, expected: { washed: s.stages.washed + 10 }, reason: "Recount" });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(new RegExp(`washed is now ${s.stages.washed}, not ${s.stages.washed + 10}`));
    expect(res.body.error.totals?.washed).toBe(s.stages.washed);
    expect(await stock()).toEqual(s);
  });

  it("refuses a count that would leave fewer processed cans than are claimed", async () => {
    expect((await bld.json("POST", `/api/heaters/${g.heaterIds[1]}/claims`, { quantity: 100 })).status).toBe(201);
    const s = await stock();
    const expected = { good: s.stages.good, washed: s.stages.washed, opened: s.stages.opened, punched: s.stages.punched };
    const res = await count({ counted: { good: 0, washed: 0, opened: 0, punched: 99 }, expected, reason: "Most of it went missing" });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/leaves 99 .* claimed 100/);
    expect(await stock()).toEqual(s);
  });

  it("refuses a count without a reason or without any difference, and a volunteer's count", async () => {
    const s = await stock();
    const noReason = await count({ counted: { good: s.stages.good + 1 }, expected: { good: s.stages.good }, reason: "  " });
    expect(noReason.status).toBe(422);
    expect(noReason.body.error.fields?.reason).toMatch(/why/);
    const same = await count({ counted: { good: s.stages.good }, expected: { good: s.stages.good }, reason: "Checked" });
    expect(same.status).toBe(422);
    expect((await count({ counted: { hauled: 5 }, expected: { hauled: 5 }, reason: "Estimate" })).status).toBe(422);
    expect((await count({ counted: { good: s.stages.good + 1 }, expected: { good: s.stages.good }, reason: "Mine" }, vol)).status).toBe(403);
    expect(await stock()).toEqual(s);
  });

  it("leaves every running total equal to the sum of its lines", async () => {
    expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
  });
});
