import { beforeAll, describe, expect, it } from "vitest";
import { signedInAll, type ApiClient } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { testDb } from "@/tests/support/db";

// Organisers move claimed cans between units of a drive: a release and a
// claim in one transaction, never leaving a balance negative. Runs on the
// ended harvest drive so the running winter drive's numbers stay as seeded.
const f = demoFixtureForFile();
let builder: ApiClient;
let organiser: ApiClient;
let other: ApiClient;
let harvestId: string;
let a: string;
let b: string;

type Heater = { id: string; claimed: number; builtIn: number; state: string };

beforeAll(async () => {
  [builder, organiser, other] = await signedInAll(DEMO.builder, DEMO.organiser, DEMO.otherOrganiser);
  harvestId = (await testDb()("drives").where({ slug: "larkhollow-harvest-2026" }).first()).id;
  const plan = { glazingWidth: 24, glazingHeight: 30, unit: "in", coverage: "chamber" };
  a = (await builder.json<{ id: string }>("POST", "/api/heaters", { name: "Move test A", driveId: harvestId, plan })).body.id;
  b = (await builder.json<{ id: string }>("POST", "/api/heaters", { name: "Move test B", driveId: harvestId, plan })).body.id;
});

async function heater(id: string): Promise<Heater> {
  const list = await builder.json<Heater[]>("GET", "/api/heaters");
  const found = list.body.find((h) => h.id === id);
  if (!found) throw new Error(`unit ${id} not in /api/heaters`);
  return found;
}

describe("POST /api/heaters/{id}/claim-moves", () => {
  it("moves claimed cans from one unit to another and refuses what would overdraw", async () => {
    const claim = await builder.json<{ movementId: string }>("POST", `/api/heaters/${a}/claims`, { quantity: 10 });
    expect(claim.status).toBe(201);
    expect(claim.body.movementId).toBeTruthy();

    const move = await organiser.json("POST", `/api/heaters/${a}/claim-moves`, { toHeaterId: b, quantity: 4 }, { "Idempotency-Key": `move-${a}` });
    expect(move.status).toBe(201);
    expect((await heater(a)).claimed).toBe(6);
    expect((await heater(b)).claimed).toBe(4);
    expect((await heater(b)).state).toBe("claiming");

    // A replay with the same key changes nothing.
    const again = await organiser.json("POST", `/api/heaters/${a}/claim-moves`, { toHeaterId: b, quantity: 4 }, { "Idempotency-Key": `move-${a}` });
    expect(again.status).toBe(201);
    expect((await heater(a)).claimed).toBe(6);

    // More than A holds: 409, and both units keep their claims.
    const over = await organiser.json("POST", `/api/heaters/${a}/claim-moves`, { toHeaterId: b, quantity: 7 });
    expect(over.status).toBe(409);
    expect((await heater(a)).claimed).toBe(6);
    expect((await heater(b)).claimed).toBe(4);
  });

  it("is for organisers of the group, between units of the same drive", async () => {
    expect((await builder.json("POST", `/api/heaters/${a}/claim-moves`, { toHeaterId: b, quantity: 1 })).status).toBe(403);
    expect((await other.json("POST", `/api/heaters/${a}/claim-moves`, { toHeaterId: b, quantity: 1 })).status).toBe(404);
    const toOtherGroup = await organiser.json<{ error: { fields?: Record<string, string> } }>("POST", `/api/heaters/${a}/claim-moves`, {
      toHeaterId: f.otherHeaterId,
      quantity: 1,
    });
    expect(toOtherGroup.status).toBe(404);
    expect(toOtherGroup.body.error.fields?.toHeaterId).toBeTruthy();
    // The seeded library unit is on the winter drive, not the harvest drive.
    expect((await organiser.json("POST", `/api/heaters/${a}/claim-moves`, { toHeaterId: f.demoHeaterId, quantity: 1 })).status).toBe(409);
    expect((await heater(a)).claimed).toBe(6);
    // Give the cans back so the harvest drive ends as it began.
    expect((await builder.json("POST", `/api/heaters/${a}/releases`, { quantity: 6 })).status).toBe(201);
    expect((await builder.json("POST", `/api/heaters/${b}/releases`, { quantity: 4 })).status).toBe(201);
  });
});
