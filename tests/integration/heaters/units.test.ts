import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ApiClient, signedInAll } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { testDb } from "@/tests/support/db";

// Saving plans as heater units and moving their state: group scoping, roles,
// the forward-only rule, and the drive's target growing with each unit.
const f = demoFixtureForFile();
let builder: ApiClient;
let organiser: ApiClient;
let volunteer: ApiClient;
let other: ApiClient;
const created: string[] = [];

type Unit = { id: string; cans: number; columns: number; rows: number; state: string; driveId: string };
const plan = { glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" };

beforeAll(async () => {
  [builder, organiser, volunteer, other] = await signedInAll(DEMO.builder, DEMO.organiser, DEMO.volunteer, DEMO.otherOrganiser);
});

afterAll(async () => {
  if (created.length) await testDb()("heater_units").whereIn("id", created).delete();
});

async function driveTargetText(client: ApiClient): Promise<number> {
  const html = (await (await client.get("/units")).text()).replace(/<!-- -->/g, "");
  const m = new RegExp(`data-testid="drive-target-${f.demoDriveSlug}"[\\s\\S]*?Target <strong[^>]*>([\\d,]+) cans`).exec(html);
  if (!m) throw new Error("drive target not found on /units");
  return Number(m[1].replace(/,/g, ""));
}

async function create(client: ApiClient, body: unknown) {
  const res = await client.json<Unit & { error?: { code: string; fields?: Record<string, string> } }>("POST", "/api/heaters", body);
  if (res.status === 201) created.push(res.body.id);
  return res;
}

describe("POST /api/heaters", () => {
  it("saves a plan with server-computed counts and grows the drive's target by its cans plus the spare", async () => {
    const before = await driveTargetText(builder);
    const seeded = await testDb()("heater_units").where({ drive_id: f.demoDriveId }).sum<{ sum: string }[]>("cans as sum");
    const res = await create(builder, { name: "Workshop test unit", driveId: f.demoDriveId, plan: { ...plan, columns: 99 } });
    expect(res.status).toBe(201);
    // Common practice, no published source: 30 × 60 in over the chamber → 11 × 12 = 132 cans.
    expect(res.body).toMatchObject({ columns: 11, rows: 12, cans: 132, state: "planned", driveId: f.demoDriveId });
    const after = await driveTargetText(builder);
    // Target = Σ unit cans + ⌈5 %⌉ spare (PRODUCT.md computation 2).
    const sum = Number(seeded[0].sum);
    expect(before).toBe(sum + Math.ceil(sum * 0.05));
    expect(after).toBe(sum + 132 + Math.ceil((sum + 132) * 0.05));
  });

  it("refuses another group's drive as not found, naming the field", async () => {
    const res = await create(builder, { name: "Sneaky", driveId: f.otherDriveId, plan });
    expect(res.status).toBe(404);
    expect(res.body.error?.fields?.driveId).toBeTruthy();
    const mine = await create(other, { name: "Boatshed spare", driveId: f.otherDriveId, plan });
    expect(mine.status).toBe(201);
    const theirs = await create(other, { name: "Into Larkhollow", driveId: f.demoDriveId, plan });
    expect(theirs.status).toBe(404);
  });

  it("checks the role and the input", async () => {
    expect((await create(new ApiClient(), { name: "x", driveId: f.demoDriveId, plan })).status).toBe(401);
    expect((await create(volunteer, { name: "x", driveId: f.demoDriveId, plan })).status).toBe(403);
    const bad = await create(organiser, { name: " ", driveId: "nope", plan: { ...plan, glazingWidth: -1 } });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.error?.fields ?? {}).sort()).toEqual(["driveId", "name", "plan.glazingWidth"]);
  });
});

describe("POST /api/heaters/{id}/state", () => {
  it("moves forward for builders, back one step only for organisers, and hides other groups' units", async () => {
    const res = await create(builder, { name: "State walk", driveId: f.demoDriveId, plan });
    const id = res.body.id;
    const move = (c: ApiClient, state: string) => c.json<Unit>("POST", `/api/heaters/${id}/state`, { state });
    expect((await move(builder, "claiming")).body.state).toBe("claiming");
    expect((await move(builder, "planned")).status).toBe(409);
    expect((await move(builder, "claiming")).status).toBe(409);
    expect((await move(organiser, "planned")).status).toBe(200);
    expect((await move(builder, "building")).body.state).toBe("building");
    expect((await move(organiser, "planned")).status).toBe(409);
    expect((await move(volunteer, "installed")).status).toBe(403);
    expect((await move(other, "installed")).status).toBe(404);
    expect((await move(builder, "installed")).body.state).toBe("installed");
    const row = await testDb()("heater_units").where({ id }).first();
    expect(row.state).toBe("installed");
  });
});
