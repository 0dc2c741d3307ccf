import { beforeAll, describe, expect, it } from "vitest";
import { signedInAll, type ApiClient } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { testDb } from "@/tests/support/db";
import { demoFixtureForFile } from "@/tests/support/fixtures";

interface Run {
  id: string;
  state: string;
  stopList: { id: string; status: string; haulId: string | null; dropPoint: { id: string } }[];
}
interface Tally {
  hauls: number;
  bags: number;
}

const f = demoFixtureForFile();
let organiser: ApiClient;
let volunteer: ApiClient;
let run: Run;

beforeAll(async () => {
  [organiser, volunteer] = await signedInAll(DEMO.organiser, DEMO.volunteer);
  const db = testDb();
  const points = await db("drop_points").where({ drive_id: f.demoDriveId, active: true }).orderBy("name").limit(3).pluck("id");
  const volunteerId = (await db("users").where({ email: DEMO.volunteer }).first()).id;
  const created = await organiser.json<{ id: string }>("POST", "/api/runs", {
    driveId: f.demoDriveId,
    plannedOn: "2026-12-11",
    start: { lat: 47.1978, lng: -8.0061 },
    dropPointIds: points,
    assigneeId: volunteerId,
  });
  expect(created.status).toBe(201);
  run = (await volunteer.json<Run>("GET", `/api/runs/${created.body.id}`)).body;
});

const tallies = async () =>
  (await volunteer.json<Record<string, Tally>>("GET", `/api/public/drives/${f.demoDriveSlug}/tallies`)).body;
const hauled = async () => (await volunteer.json<{ stages: { hauled: number } }>("GET", `/api/drives/${f.demoDriveId}/stock`)).body.stages.hauled;

describe("logging a haul at a stop", () => {
  it("writes the haul through the ledger, records its id on the stop, and moves tallies and state", async () => {
    const stop = run.stopList[0]!;
    const [before, hauledBefore] = [await tallies(), await hauled()];
    const res = await volunteer.json<{ haul: { id: string; estimatedCans: number; movementId: string }; run: Run }>(
      "POST",
      `/api/runs/${run.id}/stops/${stop.id}/haul`,
      { bags: 3 },
      { "Idempotency-Key": `run-haul-${run.id}` },
    );
    expect(res.status).toBe(201);
    expect(res.body.haul.movementId).toBeTruthy();
    expect(res.body.run.state).toBe("under_way");
    expect(res.body.run.stopList[0]!.status).toBe("logged");
    expect(res.body.run.stopList[0]!.haulId).toBe(res.body.haul.id);
    const after = await tallies();
    expect(after[stop.dropPoint.id]!.hauls).toBe(before[stop.dropPoint.id]!.hauls + 1);
    expect(after[stop.dropPoint.id]!.bags).toBe(before[stop.dropPoint.id]!.bags + 3);
    expect(await hauled()).toBe(hauledBefore + res.body.haul.estimatedCans);
    const stored = await testDb()("hauls").where({ id: res.body.haul.id }).first();
    expect(stored.drop_point_id).toBe(stop.dropPoint.id);

    // The same key and body replays the first answer and writes nothing more.
    const again = await volunteer.json<{ haul: { id: string } }>("POST", `/api/runs/${run.id}/stops/${stop.id}/haul`, { bags: 3 }, {
      "Idempotency-Key": `run-haul-${run.id}`,
    });
    expect(again.status).toBe(201);
    expect(again.body.haul.id).toBe(res.body.haul.id);
    expect((await tallies())[stop.dropPoint.id]!.hauls).toBe(after[stop.dropPoint.id]!.hauls);

    // A new request at a settled stop is refused before any haul is written.
    const settled = await volunteer.json("POST", `/api/runs/${run.id}/stops/${stop.id}/haul`, { bags: 1 });
    expect(settled.status).toBe(409);
    expect((await tallies())[stop.dropPoint.id]!.hauls).toBe(after[stop.dropPoint.id]!.hauls);
  });

  it("refuses an empty haul with the ledger's field error and leaves the stop pending", async () => {
    const stop = run.stopList[1]!;
    const res = await volunteer.json<{ error: { fields: Record<string, string> } }>("POST", `/api/runs/${run.id}/stops/${stop.id}/haul`, { bags: 0 });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.bags).toMatch(/bags, the weight, or both/);
    const now = (await volunteer.json<Run>("GET", `/api/runs/${run.id}`)).body;
    expect(now.stopList[1]!.status).toBe("pending");
  });

  it("finishes the run when the last stops are logged and skipped", async () => {
    const logged = await organiser.json<{ run: Run }>("POST", `/api/runs/${run.id}/stops/${run.stopList[1]!.id}/haul`, { bags: 1, weightKg: 2.5 });
    expect(logged.status).toBe(201);
    expect(logged.body.run.state).toBe("under_way");
    const skipped = await volunteer.json<Run>("POST", `/api/runs/${run.id}/stops/${run.stopList[2]!.id}/skip`, { reason: "Gate locked" });
    expect(skipped.body.state).toBe("done");
  });
});
