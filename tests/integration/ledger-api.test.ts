import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";
import { totalsMismatches } from "@/tests/support/ledger-totals";

type Stock = { stages: Record<string, number>; rejected: Record<string, number>; claimed: number; unclaimed: number };

let g: FreshGroup;
let vol: ApiClient;
let org: ApiClient;
let bld: ApiClient;
const stock = async () => (await org.json<Stock>("GET", `/api/drives/${g.driveId}/stock`)).body;

beforeAll(async () => {
  g = await freshGroup("api");
  [vol, org, bld] = await Promise.all([g.client("volunteer"), g.client("organiser"), g.client("builder")]);
});
afterAll(closeTestDb);

describe("Idempotency-Key", () => {
  it("replays the first answer for the same key and body, and refuses the key with another body", async () => {
    const key = randomUUID();
    const body = { dropPointId: g.dropPointIds[0], bags: 3 };
    const first = await vol.json<{ id: string; movementId: string; estimatedCans: number }>("POST", `/api/drives/${g.driveId}/hauls`, body, { "idempotency-key": key });
    expect(first.status).toBe(201);
    expect(first.body.movementId).toMatch(/^[0-9a-f-]{36}$/);
    const before = await stock();
    const again = await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { bags: 3, dropPointId: g.dropPointIds[0] }, { "idempotency-key": key });
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(await stock()).toEqual(before);
    const hauls = await testDb()("hauls").where({ drive_id: g.driveId }).count({ n: "*" }).first();
    expect(Number(hauls?.n)).toBe(1);

    const other = await vol.json<{ error: { code: string } }>("POST", `/api/drives/${g.driveId}/hauls`, { ...body, bags: 4 }, { "idempotency-key": key });
    expect(other.status).toBe(409);
    expect(other.body.error.code).toBe("conflict");
    expect(await stock()).toEqual(before);
  });

  it("replays a refusal too, so a retried overdraw never goes through later", async () => {
    const key = randomUUID();
    const body = { from: "punched", to: "punched", quantity: 1 };
    const bad = await vol.json("POST", `/api/drives/${g.driveId}/processing`, { from: "washed", to: "punched", quantity: 999_999 }, { "idempotency-key": key });
    expect(bad.status).toBe(409);
    const replay = await vol.json("POST", `/api/drives/${g.driveId}/processing`, { from: "washed", to: "punched", quantity: 999_999 }, { "idempotency-key": key });
    expect(replay).toEqual(bad);
    expect((await vol.json("POST", `/api/drives/${g.driveId}/processing`, body)).status).toBe(422);
  });
});

describe("sorts, processing, claims and undo", () => {
  it("moves cans through the stages and keeps unclaimed = good + washed + opened + punched − claimed", async () => {
    const start = await stock();
    const { haul, sort } = await haulAndSort(vol, g.driveId, g.dropPointIds[1], 200, { dented: 12, wrongSize: 5 });
    expect(sort.movementId).toBeTruthy();
    let s = await stock();
    expect(s.stages.good).toBe(start.stages.good + 200);
    expect(s.rejected.dented).toBe(start.rejected.dented + 12);
    expect(s.rejected.wrongSize).toBe(start.rejected.wrongSize + 5);
    expect(s.stages.hauled).toBe(start.stages.hauled); // the haul's estimate was closed by the sort

    const wash = await vol.json<{ movementId: string }>("POST", `/api/drives/${g.driveId}/processing`, { from: "good", to: "washed", quantity: 150 });
    expect(wash.status).toBe(201);
    const punch = await vol.json<{ holes: number; holesPerCan: number }>("POST", `/api/drives/${g.driveId}/processing`, { from: "washed", to: "punched", quantity: 100 });
    expect(punch.status).toBe(201);
    expect(punch.body).toMatchObject({ holesPerCan: 4, holes: 400 });
    const claim = await bld.json<{ movementId: string; state: string }>("POST", `/api/heaters/${g.heaterIds[0]}/claims`, { quantity: 132 });
    expect(claim.status).toBe(201);
    expect(claim.body.state).toBe("claiming");
    const built = await bld.json("POST", `/api/heaters/${g.heaterIds[0]}/built-in`, { quantity: 60 });
    expect(built.status).toBe(201);
    s = await stock();
    const processed = s.stages.good + s.stages.washed + s.stages.opened + s.stages.punched;
    expect(s.claimed).toBe(start.claimed + 72);
    expect(s.unclaimed).toBe(processed - s.claimed);
    expect(s.stages.builtIn).toBe(start.stages.builtIn + 60);
    const heaters = (await bld.json<{ id: string; claimed: number; builtIn: number; state: string }[]>("GET", "/api/heaters")).body;
    expect(heaters.find((h) => h.id === g.heaterIds[0])).toMatchObject({ claimed: 72, builtIn: 60, state: "building" });

    // More than the unclaimed cans: 409 with what is left. (The unit is made big enough that the
    // drive's unclaimed cans, not the unit's need, is what the claim runs into.)
    await testDb()("heater_units").where({ id: g.heaterIds[1] }).update({ columns: 50, rows: 40, cans: 2000 });
    const greedy = await bld.json<{ error: { message: string } }>("POST", `/api/heaters/${g.heaterIds[1]}/claims`, { quantity: s.unclaimed + 1 });
    expect(greedy.status).toBe(409);
    expect(greedy.body.error.message).toMatch(new RegExp(`only ${s.unclaimed} left`));

    // Undo a wash: a new line, history keeps both. (Undoing the first wash
    // would need 150 washed cans, but 100 have moved on: that is a 409.)
    expect((await vol.json("POST", `/api/movements/${wash.body.movementId}/reversal`)).status).toBe(409);
    const wash2 = await vol.json<{ movementId: string }>("POST", `/api/drives/${g.driveId}/processing`, { from: "good", to: "washed", quantity: 20 });
    const mid = await stock();
    const undo = await vol.json<{ movementId: string }>("POST", `/api/movements/${wash2.body.movementId}/reversal`);
    expect(undo.status).toBe(201);
    expect(undo.body.movementId).not.toBe(wash2.body.movementId);
    expect((await vol.json("POST", `/api/movements/${wash2.body.movementId}/reversal`)).status).toBe(409);
    const after = await stock();
    expect(after.stages.washed).toBe(mid.stages.washed - 20);
    expect(after.stages.good).toBe(mid.stages.good + 20);
    const lines = await testDb()("ledger_lines").where({ drive_id: g.driveId, from_stage: "washed", to_stage: "good" });
    expect(lines).toHaveLength(1);
    expect(lines[0].reverses_id).not.toBeNull();
    expect(lines[0].quantity).toBe(20);

    // A sorted haul cannot be undone before its sort; another volunteer cannot undo it at all.
    expect((await vol.json("POST", `/api/movements/${haul.movementId}/reversal`)).status).toBe(409);
    const vol2 = await g.client("volunteer2");
    expect((await vol2.json("POST", `/api/movements/${sort.movementId}/reversal`)).status).toBe(403);
  });

  it("keeps every running total equal to the sum of its lines after those writes and undos", async () => {
    expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
  });
});

describe("the ledger itself", () => {
  it("refuses UPDATE and DELETE of a ledger line issued straight at the database", async () => {
    const line = await testDb()("ledger_lines").where({ group_id: g.groupId }).first();
    await expect(testDb()("ledger_lines").where({ id: line.id }).update({ quantity: line.quantity + 1 })).rejects.toThrow(/append-only/);
    await expect(testDb()("ledger_lines").where({ id: line.id }).delete()).rejects.toThrow(/append-only/);
    await expect(testDb().raw("truncate ledger_lines cascade")).rejects.toThrow(/append-only/);
    const still = await testDb()("ledger_lines").where({ id: line.id }).first();
    expect(still.quantity).toBe(line.quantity);
  });
});
