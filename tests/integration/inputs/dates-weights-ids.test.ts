import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ApiClient, signedIn, signedInAll } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { createOwnGroup, type OwnGroup } from "@/tests/support/own-group";

// Finding 8 of the security review: inputs that passed validation and then
// failed in PostgreSQL as a 500. Each must be a refusal a person can act on.
const WINDOW = "Use a date between 2000 and 2100.";
const UNDER_ONE_CAN = "That weight is under one can; enter the bag count instead or weigh again.";
type Refusal = { error: { code: string; message: string; fields?: Record<string, string> } };

let g: OwnGroup;
let organiser: ApiClient;
let volunteer: ApiClient;
let volunteerId: string;

beforeAll(async () => {
  const db = testDb();
  g = await createOwnGroup(db, "inputs");
  [organiser, volunteer] = await signedInAll(g.emails.organiser, g.emails.volunteer);
  volunteerId = (await db("users").where({ email: g.emails.volunteer }).first()).id;
});
afterAll(closeTestDb);

const refusedField = (res: { status: number; body: unknown }, field: string, message: string | RegExp) => {
  expect(res.status, JSON.stringify(res.body)).toBe(422);
  const said = (res.body as Refusal).error.fields?.[field];
  if (typeof message === "string") expect(said).toBe(message);
  else expect(said).toMatch(message);
};

describe("dates outside 2000–2100", () => {
  // Year 0000 does not exist in PostgreSQL's calendar (it went to the database and failed);
  // 1900 and 9999 are real dates that no can drive has.
  const YEARS = ["0000", "1900", "9999"];

  it.each(YEARS)("a pledge to bring cans in %s is a 422", async (year) => {
    const res = await new ApiClient().json("POST", `/api/public/drives/${g.driveSlug}/pledges`, { dropPointId: g.dropPointId, bags: 1, bringOn: `${year}-06-01` });
    refusedField(res, "bringOn", WINDOW);
  });

  it.each(YEARS)("a drive starting in %s is a 422", async (year) => {
    const res = await organiser.json("POST", "/api/drives", { name: "Far-off drive", slug: `far-off-${year}-${g.groupId.slice(0, 6)}`, startsOn: `${year}-01-01`, endsOn: "2026-12-31", isPublic: false });
    refusedField(res, "startsOn", WINDOW);
  });

  it.each(YEARS)("a run planned in %s is a 422", async (year) => {
    const res = await organiser.json("POST", "/api/runs", { driveId: g.driveId, plannedOn: `${year}-01-02`, start: { lat: 52, lng: -1.6 }, dropPointIds: [g.dropPointId], assigneeId: volunteerId });
    refusedField(res, "plannedOn", WINDOW);
  });

  it.each(YEARS)("a haul dated %s is a 422", async (year) => {
    const res = await volunteer.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointId, bags: 1, hauledAt: `${year}-01-01T00:00:00Z` });
    refusedField(res, "hauledAt", WINDOW);
  });

  it.each(YEARS)("the ledger filtered from %s is a 422, in the list and the export", async (year) => {
    for (const path of ["/api/ledger", "/api/ledger/export"]) {
      const res = await organiser.json("GET", `${path}?from=${year}-01-01`);
      refusedField(res, "from", WINDOW);
    }
  });

  it("the window's edges are accepted where no nearer rule applies: a drive, and the ledger's filter", async () => {
    const drive = await organiser.json("POST", "/api/drives", { name: "Long drive", slug: `long-${g.groupId.slice(0, 6)}`, startsOn: "2000-01-01", endsOn: "2100-12-31", isPublic: false });
    expect(drive.status, JSON.stringify(drive.body)).toBe(201);
    const list = await organiser.json<unknown[]>("GET", "/api/ledger?from=2000-01-01&to=2100-12-31");
    expect(list.status).toBe(200);
  });

  it("a haul at the window's first moment passes the window but not the entry-time rule", async () => {
    // Entries are also checked against the clock (lib/ledger/entry-time.ts): the answer names that rule, not the window.
    const res = await volunteer.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointId, bags: 1, hauledAt: "2000-01-01T00:00:00Z" });
    refusedField(res, "hauledAt", /five years ago/);
  });
});

describe("weights that round to no cans", () => {
  it("a 0.4 g haul is refused with what to do instead, and nothing is written", async () => {
    const before = await testDb()("hauls").where({ group_id: g.groupId }).count<{ count: string }[]>("* as count");
    const res = await volunteer.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointId, bags: 0, weightKg: 0.0004 });
    refusedField(res, "weightKg", UNDER_ONE_CAN);
    const withBags = await volunteer.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointId, bags: 2, weightKg: 0.005 });
    refusedField(withBags, "weightKg", UNDER_ONE_CAN);
    const after = await testDb()("hauls").where({ group_id: g.groupId }).count<{ count: string }[]>("* as count");
    expect(after[0].count).toBe(before[0].count);
  });

  it("one can's mass (1 lb ÷ 34, the trade associations' figure in lib/ledger/estimate.ts) is enough", async () => {
    const res = await volunteer.json<{ estimatedCans: number }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointId, bags: 0, weightKg: 0.0134 });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.estimatedCans).toBe(1);
  });

  it("the same refusal at a run's stop, and the stop stays pending", async () => {
    const run = await organiser.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn: "2026-12-12", start: { lat: 52, lng: -1.6 }, dropPointIds: [g.dropPointId], assigneeId: volunteerId });
    expect(run.status).toBe(201);
    const detail = await volunteer.json<{ stopList: { id: string; status: string }[] }>("GET", `/api/runs/${run.body.id}`);
    const stop = detail.body.stopList[0]!;
    const res = await volunteer.json("POST", `/api/runs/${run.body.id}/stops/${stop.id}/haul`, { bags: 0, weightKg: 0.0004 });
    refusedField(res, "weightKg", UNDER_ONE_CAN);
    const again = await volunteer.json<{ stopList: { status: string }[] }>("GET", `/api/runs/${run.body.id}`);
    expect(again.body.stopList[0]!.status).toBe("pending");
  });

  it("a group whose counted cans are heavy still gets the refusal when its own ratio rounds a weight to no cans", async () => {
    // 1 can per kg over 1000 weighed hauls: 0.1 kg blends to well under half a can.
    const other = await createOwnGroup(testDb(), "heavy-cans");
    await testDb()("group_calibration").insert({ group_id: other.groupId, weight_hauls: 1000, weight_cans: 1000, weight_kg: 1000 });
    const client = await signedIn(other.emails.volunteer);
    const res = await client.json("POST", `/api/drives/${other.driveId}/hauls`, { dropPointId: other.dropPointId, bags: 0, weightKg: 0.1 });
    refusedField(res, "weightKg", UNDER_ONE_CAN);
  });
});

describe("ids that are not UUIDs", () => {
  it.each(["-".repeat(36), "0".repeat(36), "not-a-uuid", "00000000-0000-0000-0000-00000000000g"])("a fill report at drop point %s is a 404", async (id) => {
    const res = await new ApiClient().json<Refusal>("POST", `/api/public/drives/${g.driveSlug}/drop-points/${id}/fill-reports`, { level: 50 });
    expect(res.status, JSON.stringify(res.body)).toBe(404);
    expect(res.body.error.code).toBe("not_found");
  });
});
