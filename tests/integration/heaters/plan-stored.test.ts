import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb } from "@/tests/support/db";
import { DEMO } from "@/tests/support/env";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { ApiClient, signedInAll } from "@/tests/support/http";

// A unit saved through the API stores every plan length it was planned with,
// blanks filled with the defaults once, on writing (migration 20261218010000
// made the columns NOT NULL; plan-resolved.test.ts migrates the units saved before).
const f = demoFixtureForFile();
let builder: ApiClient;
let organiser: ApiClient;
const created: string[] = [];

beforeAll(async () => {
  [builder, organiser] = await signedInAll(DEMO.builder, DEMO.organiser);
});
afterAll(async () => {
  if (created.length) await testDb()("heater_units").whereIn("id", created).delete();
});

describe("a unit saved now stores its values", () => {
  it("writes the defaults of every blank into the unit, in the plan's unit, and keeps them through a glazing change", async () => {
    const res = await builder.json<{ id: string; cans: number }>("POST", "/api/heaters", {
      name: "Stored values test unit",
      driveId: f.demoDriveId,
      plan: { glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "full", edgeClearance: 0.5 },
    });
    expect(res.status).toBe(201);
    created.push(res.body.id);
    const row = await testDb()("heater_units").where({ id: res.body.id }).first();
    // lib/heaters/grid-input.ts: 66 mm × 122 mm can, 127 mm manifolds, no frame allowance; in inches here.
    expect(row).toMatchObject({
      unit: "in",
      can_diameter: 66 / 25.4,
      can_length: 122 / 25.4,
      manifold_height: 127 / 25.4,
      edge_clearance: 0.5,
      frame_allowance_width: 0,
      frame_allowance_height: 0,
      holes_per_can: 4,
    });

    const changed = await organiser.json(
      "POST",
      `/api/heaters/${res.body.id}/glazing`,
      { plan: { glazingWidth: 32, glazingHeight: 64, unit: "in", coverage: "full", edgeClearance: 0.5, canDiameter: 2.5 } },
      { "Idempotency-Key": randomUUID() },
    );
    expect(changed.status).toBe(200);
    const after = await testDb()("heater_units").where({ id: res.body.id }).first();
    expect(after).toMatchObject({ glazing_width: 32, can_diameter: 2.5, can_length: 122 / 25.4, manifold_height: 127 / 25.4, frame_allowance_width: 0 });
  });
});
