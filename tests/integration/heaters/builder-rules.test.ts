import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";
import { planColumns } from "@/lib/heaters/plan-columns";

// Builders act only on the units they build; organisers keep every power.
// (Issue 12 finding 7: a builder released cans from the organiser's unit,
// then could claim them for their own, and moved it to installed.)
let g: FreshGroup;
let bld: ApiClient;
let org: ApiClient;
let organisersUnit: string;

type Err = { error: { code: string; message: string } };
type Heater = { id: string; claimed: number; builtIn: number; state: string };

beforeAll(async () => {
  g = await freshGroup("builders");
  [bld, org] = await Promise.all([g.client("builder"), g.client("organiser")]);
  await haulAndSort(await g.client("volunteer"), g.driveId, g.dropPointIds[0], 400);
  const vol = await g.client("volunteer");
  expect((await vol.json("POST", `/api/drives/${g.driveId}/processing`, { from: "good", to: "punched", quantity: 100 })).status).toBe(201);
  const plan = { glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" };
  const saved = await org.json<{ id: string }>("POST", "/api/heaters", { name: "Organiser's own unit", driveId: g.driveId, plan });
  expect(saved.status).toBe(201);
  organisersUnit = saved.body.id;
});
afterAll(closeTestDb);

const linesOf = async (unitId: string) => Number((await testDb()("ledger_lines").where({ heater_unit_id: unitId }).count({ n: "*" }).first())?.n);
const heater = async (id: string) => (await bld.json<Heater[]>("GET", "/api/heaters")).body.find((h) => h.id === id)!;
type Step = [what: string, body: unknown, status: number];
/** Posts each step to the unit in turn and expects its status. */
async function steps(client: ApiClient, unitId: string, list: Step[]) {
  for (const [what, body, status] of list) expect((await client.json("POST", `/api/heaters/${unitId}/${what}`, body)).status, what).toBe(status);
}
/** Claim cans, start building, record some built in, release some: each one allowed. */
const buildSteps = (claimed: number, builtIn: number, released: number): Step[] => [
  ["claims", { quantity: claimed }, 201],
  ["state", { state: "building" }, 200],
  ["built-in", { quantity: builtIn }, 201],
  ["releases", { quantity: released }, 201],
];

describe("a builder on a unit someone else builds", () => {
  it("may not claim, release, record built in or move its state: 403 naming who builds it", async () => {
    expect((await org.json("POST", `/api/heaters/${organisersUnit}/claims`, { quantity: 30 })).status).toBe(201);
    const lines = await linesOf(organisersUnit);
    const tries: Array<[string, unknown]> = [
      ["releases", { quantity: 30 }],
      ["claims", { quantity: 5 }],
      ["built-in", { quantity: 5 }],
      ["state", { state: "installed" }],
    ];
    for (const [what, body] of tries) {
      const res = await bld.json<Err>("POST", `/api/heaters/${organisersUnit}/${what}`, body);
      expect(res.status, what).toBe(403);
      expect(res.body.error.code).toBe("forbidden");
      expect(res.body.error.message).toMatch(/^This unit is built by Test organiser; only they or an organiser can /);
    }
    // Nothing was written: the organiser's claim stands whole, the unit is where it was.
    expect(await linesOf(organisersUnit)).toBe(lines);
    expect(await heater(organisersUnit)).toMatchObject({ claimed: 30, builtIn: 0, state: "claiming" });
    // The organiser-only move of claims stays the organiser's.
    expect((await bld.json("POST", `/api/heaters/${organisersUnit}/claim-moves`, { toHeaterId: g.heaterIds[0], quantity: 5 })).status).toBe(403);
  });

  it("still works on their own units", async () => {
    const own = g.heaterIds[0];
    await steps(bld, own, buildSteps(20, 4, 6));
    expect(await heater(own)).toMatchObject({ claimed: 10, builtIn: 4, state: "building" });
  });
});

describe("an organiser", () => {
  it("keeps every power over the builder's units", async () => {
    const theirs = g.heaterIds[1];
    await steps(org, theirs, [
      ...buildSteps(12, 2, 1),
      ["claim-moves", { toHeaterId: organisersUnit, quantity: 3 }, 201],
      ["state", { state: "claiming" }, 200],
    ]);
    expect(await heater(theirs)).toMatchObject({ claimed: 6, builtIn: 2, state: "claiming" });
    expect((await heater(organisersUnit)).claimed).toBe(33);
  });

  it("and a unit whose builder left is the organisers' alone", async () => {
    const [orphan] = await testDb()("heater_units")
      .insert({ group_id: g.groupId, drive_id: g.driveId, builder_id: null, name: "Orphan unit", ...planColumns({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" }), columns: 11, rows: 12, cans: 132 })
      .returning("id");
    const refused = await bld.json<Err>("POST", `/api/heaters/${orphan.id}/claims`, { quantity: 1 });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/no builder any more; only an organiser/);
    expect((await org.json("POST", `/api/heaters/${orphan.id}/claims`, { quantity: 1 })).status).toBe(201);
  });
});
