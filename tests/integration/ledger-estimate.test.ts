import { beforeAll, describe, expect, it } from "vitest";
import { freshGroupForFile } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

type Haul = { id: string; estimatedCans: number; estimate: { method: string; countedHauls: number; calibrated: boolean } };

// The haul estimate through the API, in a group with no counted hauls yet.
const g = freshGroupForFile("estimate");
let vol: ApiClient;
beforeAll(async () => {
  vol = await g.client("volunteer");
});

const haul = (body: object) => vol.json<Haul>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], ...body });

describe("haul estimates", () => {
  it("estimates one pound of cans as 34 cans, then moves toward what a sort counted", async () => {
    // 1 lb = 0.45359237 kg exactly by definition (NIST SP 811, appendix B);
    // 34 empty cans per pound: the aluminium can industry's trade associations' published figure (2009).
    const pound = 0.45359237;
    const first = await haul({ bags: 1, weightKg: pound });
    expect(first.status).toBe(201);
    expect(first.body.estimatedCans).toBe(34);
    expect(first.body.estimate).toMatchObject({ method: "weight", countedHauls: 0, calibrated: false });

    // Bags only: 60 cans a bag by default (common practice, no published source).
    const bagsOnly = await haul({ bags: 2 });
    expect(bagsOnly.body.estimatedCans).toBe(120);

    // The sort counts 50 cans in that pound. With the default worth 3 counted
    // hauls, the ratio estimator blends to (3·34 + 1·50) ÷ 4 = 38 cans per pound.
    const sort = await vol.json("POST", `/api/drives/${g.driveId}/sorts`, { haulIds: [first.body.id], good: 46, rejected: { dented: 4 } });
    expect(sort.status).toBe(201);
    const next = await haul({ bags: 1, weightKg: pound });
    expect(next.body.estimatedCans).toBe(38);
    expect(next.body.estimate).toMatchObject({ method: "weight", countedHauls: 1, calibrated: true });
    expect(next.body.estimatedCans).toBeGreaterThan(34);
    expect(next.body.estimatedCans).toBeLessThan(50);

    // Bags move the same way: (3·60 + 1·50) ÷ 4 = 57.5 a bag, so two bags ≈ 115.
    const bags = await haul({ bags: 2 });
    expect(bags.body.estimatedCans).toBe(115);
  });

  it("refuses a haul with neither bags nor weight, saying which field", async () => {
    const res = await vol.json<{ error: { fields: Record<string, string> } }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 0 });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.bags).toMatch(/bags, the weight/);
  });
});
