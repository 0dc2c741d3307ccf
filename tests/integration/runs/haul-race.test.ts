import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signedInAll, type ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { createOwnGroup, type OwnGroup } from "@/tests/support/own-group";

// Two pickup runs visiting the same bin both try to settle their stop with one
// haul at the same moment. Exactly one may; the other is told why (409), never
// a 500 from the database's unique index.
const ROUNDS = 8;
type Run = { id: string; stopList: { id: string }[] };

let g: OwnGroup;
let organiser: ApiClient;
let volunteer: ApiClient;
let volunteerId: string;

beforeAll(async () => {
  g = await createOwnGroup(testDb(), "haul-race");
  [organiser, volunteer] = await signedInAll(g.emails.organiser, g.emails.volunteer);
  volunteerId = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
});
afterAll(closeTestDb);

async function newRun(): Promise<Run> {
  const created = await organiser.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn: "2026-12-14", start: { lat: 52, lng: -1.6 }, dropPointIds: [g.dropPointId], assigneeId: volunteerId });
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  return (await organiser.json<Run>("GET", `/api/runs/${created.body.id}`)).body;
}

describe("two runs logging one haul at once", () => {
  it("lets one settle its stop and answers the other 409 with a message", async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const [a, b] = await Promise.all([newRun(), newRun()]);
      const haul = await volunteer.json<{ id: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointId, bags: 1 });
      expect(haul.status).toBe(201);
      const answers = await Promise.all(
        [a, b].map((run) => volunteer.json<{ error?: { code: string; message: string } }>("POST", `/api/runs/${run.id}/stops/${run.stopList[0]!.id}/log`, { haulId: haul.body.id })),
      );
      const statuses = answers.map((r) => r.status).sort();
      expect(statuses, `round ${round}: ${JSON.stringify(answers.map((r) => r.body))}`).toEqual([200, 409]);
      const refused = answers.find((r) => r.status === 409)!;
      expect(refused.body.error).toMatchObject({ code: "conflict", message: "That haul already settles another stop." });
      const settled = await testDb()("pickup_run_stops").where({ haul_id: haul.body.id }).count<{ count: string }[]>("* as count");
      expect(Number(settled[0].count)).toBe(1);
    }
  }, 120_000);
});
