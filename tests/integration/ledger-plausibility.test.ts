import { beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { testDb } from "@/tests/support/db";
import { freshGroupForFile } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// Unusual numbers are asked about, not refused: 409 with the question, and the
// same entry with confirmUnusual: true (under a new Idempotency-Key) is recorded.
// Thresholds: common practice, no published source (lib/ledger/plausibility.ts).
type Asked = { error: { code: string; message: string; confirm: string; confirmField: string; unusual: { check: string; value: number; expected: number }[] } };
type Stock = { stages: Record<string, number> };

const g = freshGroupForFile("plausible");
let vol: ApiClient;
const stock = async () => (await vol.json<Stock>("GET", `/api/drives/${g.driveId}/stock`)).body;
const haul = async (body: Record<string, unknown>) => {
  const res = await vol.json<{ id: string; estimatedCans: number }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], ...body });
  expect(res.status).toBe(201);
  return res.body;
};

beforeAll(async () => {
  vol = await g.client("volunteer");
});

describe("a sort far from its hauls' estimate", () => {
  it("asks about 1,000,000 cans from one bag, records nothing, and records it once confirmed under a new key", async () => {
    const h = await haul({ bags: 1 });
    expect(h.estimatedCans).toBe(60); // an uncalibrated group: 60 cans a bag (common practice, no published source)
    const before = await stock();
    const key = randomUUID();
    const body = { haulIds: [h.id], good: 1_000_000 };
    const asked = await vol.json<Asked>("POST", `/api/drives/${g.driveId}/sorts`, body, { "idempotency-key": key });
    expect(asked.status).toBe(409);
    expect(asked.body.error).toMatchObject({
      code: "conflict",
      message: "That is 1,000,000 cans from 1 bag (about 60 expected). Is that right?",
      confirm: "implausible",
      confirmField: "confirmUnusual",
      unusual: [{ check: "sortVsEstimate", value: 1_000_000, expected: 60 }],
    });
    expect(await stock()).toEqual(before);
    expect((await testDb()("hauls").where({ id: h.id }).first()).sort_id).toBeNull();

    // The refusal is stored under its key: the confirmed resend with the old key is a different request.
    const sameKey = await vol.json("POST", `/api/drives/${g.driveId}/sorts`, { ...body, confirmUnusual: true }, { "idempotency-key": key });
    expect(sameKey.status).toBe(409);
    expect(await stock()).toEqual(before);

    const confirmed = await vol.json<{ counted: number }>("POST", `/api/drives/${g.driveId}/sorts`, { ...body, confirmUnusual: true }, { "idempotency-key": randomUUID() });
    expect(confirmed.status).toBe(201);
    expect(confirmed.body.counted).toBe(1_000_000);
    expect((await stock()).stages.good).toBe(before.stages.good + 1_000_000);
    // Undo it so the group's calibration is back where the next checks expect it.
    const movementId = (await testDb()("sorts").whereIn("id", [(await testDb()("hauls").where({ id: h.id }).first()).sort_id]).first()).movement_id;
    expect((await vol.json("POST", `/api/movements/${movementId}/reversal`)).status).toBe(201);
  });

  it("asks about a count under a third of the estimate; a plausible count needs no confirmation", async () => {
    const h = await haul({ bags: 10 });
    const low = await vol.json<Asked>("POST", `/api/drives/${g.driveId}/sorts`, { haulIds: [h.id], good: 100 });
    expect(low.status).toBe(409);
    expect(low.body.error.message).toBe(`That is 100 cans from 10 bags (about ${h.estimatedCans} expected). Is that right?`);
    const ok = await vol.json("POST", `/api/drives/${g.driveId}/sorts`, { haulIds: [h.id], good: Math.round(h.estimatedCans * 0.9), rejected: { dented: 5 } });
    expect(ok.status).toBe(201);
  });
});

describe("a haul far beyond its bin or the group's cans per bag", () => {
  it("asks about more than three times the bin's capacity (6 bags here), then records it confirmed", async () => {
    expect((await testDb()("drop_points").where({ id: g.dropPointIds[1] }).first()).capacity_bags).toBe(6);
    const body = { dropPointId: g.dropPointIds[1], bags: 40 };
    const asked = await vol.json<Asked>("POST", `/api/drives/${g.driveId}/hauls`, body);
    expect(asked.status).toBe(409);
    expect(asked.body.error.message).toBe("That is 40 bags from a bin that holds 6 bags. Is that right?");
    expect(asked.body.error.unusual.map((u) => u.check)).toEqual(["binCapacity"]);
    expect((await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { ...body, confirmUnusual: true })).status).toBe(201);
    expect((await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { ...body, bags: 18 })).status).toBe(201);
  });

  it("asks about one bag that weighs 50 kg", async () => {
    const asked = await vol.json<Asked>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 1, weightKg: 50 });
    expect(asked.status).toBe(409);
    expect(asked.body.error.unusual[0]).toMatchObject({ check: "calibratedRange" });
    expect(asked.body.error.message).toMatch(/^That weight is about 3,7\d\d cans in 1 bag/);
  });
});
