import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// A run's stop follows its haul: undoing the haul reopens the stop (and the run),
// the stop can then be logged again, and a skipped stop can be put back.
interface Run {
  id: string;
  state: string;
  stopList: { id: string; status: string; haulId: string | null; skipReason: string | null; haul: { movementId: string } | null }[];
}
type Asked = { error: { message: string; confirm: string } };

let g: FreshGroup;
let org: ApiClient;
let vol: ApiClient;
let run: Run;
const getRun = async () => (await vol.json<Run>("GET", `/api/runs/${run.id}`)).body;
const stopPath = (i: number) => `/api/runs/${run.id}/stops/${run.stopList[i]!.id}`;

beforeAll(async () => {
  g = await freshGroup("runs-follow");
  [org, vol] = await Promise.all([g.client("organiser"), g.client("volunteer")]);
  const volunteerId = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
  const created = await org.json<{ id: string }>("POST", "/api/runs", {
    driveId: g.driveId,
    plannedOn: "2026-12-11",
    start: { lat: 47.19, lng: -8 },
    dropPointIds: g.dropPointIds,
    assigneeId: volunteerId,
  });
  expect(created.status).toBe(201);
  run = (await vol.json<Run>("GET", `/api/runs/${created.body.id}`)).body;
});
afterAll(closeTestDb);

describe("undoing a stop's haul", () => {
  it("puts the stop back to pending and the run back to not done, in the reversal itself; the stop can be logged again", async () => {
    const logged = await vol.json<{ haul: { id: string; movementId: string } }>("POST", `${stopPath(0)}/haul`, { bags: 2 }, { "idempotency-key": randomUUID() });
    expect(logged.status).toBe(201);
    expect((await vol.json("POST", `${stopPath(1)}/skip`, { reason: "Gate locked" })).status).toBe(200);
    let r = await getRun();
    expect(r.state).toBe("done");
    expect(r.stopList[0]!.haul?.movementId).toBe(logged.body.haul.movementId);

    const undo = await vol.json("POST", `/api/movements/${logged.body.haul.movementId}/reversal`, undefined, { "idempotency-key": randomUUID() });
    expect(undo.status).toBe(201);
    r = await getRun();
    expect(r.stopList[0]).toMatchObject({ status: "pending", haulId: null, haul: null });
    expect(r.stopList[1]!.status).toBe("skipped");
    expect(r.state).toBe("under_way");
    expect((await testDb()("pickup_runs").where({ id: run.id }).first()).finished_at).toBeNull();

    const again = await vol.json<{ haul: { id: string }; run: Run }>("POST", `${stopPath(0)}/haul`, { bags: 3 }, { "idempotency-key": randomUUID() });
    expect(again.status).toBe(201);
    expect(again.body.run.stopList[0]).toMatchObject({ status: "logged", haulId: again.body.haul.id });
    expect(again.body.run.state).toBe("done");
  });
});

describe("un-skipping a stop", () => {
  it("puts a skipped stop back on the run; a stop that is not skipped is 409", async () => {
    const res = await vol.json<Run>("POST", `${stopPath(1)}/unskip`);
    expect(res.status).toBe(200);
    expect(res.body.stopList[1]).toMatchObject({ status: "pending", skipReason: null });
    expect(res.body.state).toBe("under_way");
    const twice = await vol.json<{ error: { code: string; message: string } }>("POST", `${stopPath(1)}/unskip`);
    expect(twice.status).toBe(409);
    expect(twice.body.error.message).toBe("This stop is pending, not skipped.");
    expect((await org.json("POST", `${stopPath(0)}/unskip`)).status).toBe(409); // logged, not skipped
  });

  it("asks about an unusual haul at the stop too, and records it confirmed under a new key", async () => {
    const asked = await vol.json<Asked>("POST", `${stopPath(1)}/haul`, { bags: 40 }, { "idempotency-key": randomUUID() });
    expect(asked.status).toBe(409);
    expect(asked.body.error).toMatchObject({ confirm: "implausible", message: "That is 40 bags from a bin that holds 6 bags. Is that right?" });
    expect((await getRun()).stopList[1]!.status).toBe("pending");
    const ok = await vol.json<{ run: Run }>("POST", `${stopPath(1)}/haul`, { bags: 40, confirmUnusual: true }, { "idempotency-key": randomUUID() });
    expect(ok.status).toBe(201);
    expect(ok.body.run.state).toBe("done");
  });
});
