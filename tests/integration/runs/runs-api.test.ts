import { beforeAll, describe, expect, it } from "vitest";
import turfDistance from "@turf/distance";
import { signedInAll, type ApiClient } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { testDb } from "@/tests/support/db";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { waitForMail } from "@/tests/support/mail";

interface Run {
  id: string;
  state: string;
  distanceKm: number;
  logged: number;
  skipped: number;
  stopList: { id: string; position: number; status: string; skipReason: string | null; resolvedAt: string | null; dropPoint: { id: string; name: string; hours: string; hostPhone: string | null } }[];
}

const f = demoFixtureForFile();
let organiser: ApiClient;
let volunteer: ApiClient;
let builder: ApiClient;
let other: ApiClient;
let points: { id: string; name: string; lat: number; lng: number }[];
let volunteerId: string;
let workshop: { lat: number; lng: number };

beforeAll(async () => {
  [organiser, volunteer, builder, other] = await signedInAll(DEMO.organiser, DEMO.volunteer, DEMO.builder, DEMO.otherOrganiser);
  const db = testDb();
  points = await db("drop_points").select("id", "name", "lat", "lng").where({ drive_id: f.demoDriveId, active: true }).orderBy("name");
  volunteerId = (await db("users").where({ email: DEMO.volunteer }).first()).id;
  const g = await db("groups").where({ id: f.demoGroupId }).first();
  workshop = { lat: g.workshop_lat, lng: g.workshop_lng };
});

async function planRun(ids: string[], plannedOn = "2026-12-09") {
  return organiser.json<{ id: string; order: string[]; distanceKm: number }>("POST", "/api/runs", {
    driveId: f.demoDriveId,
    plannedOn,
    start: workshop,
    dropPointIds: ids,
    assigneeId: volunteerId,
  });
}

describe("planning a run", () => {
  it("orders the stops shortest-first, stores them and e-mails the volunteer", async () => {
    const chosen = points.slice(0, 4);
    const res = await planRun(chosen.map((p) => p.id), "2026-12-10");
    expect(res.status).toBe(201);
    // Reference: @turf/distance along the returned order from the workshop.
    const byId = new Map(chosen.map((p) => [p.id, p]));
    let km = 0;
    let prev = workshop;
    for (const id of res.body.order) {
      const p = byId.get(id)!;
      km += turfDistance([prev.lng, prev.lat], [p.lng, p.lat]);
      prev = p;
    }
    expect(res.body.distanceKm).toBeCloseTo(km, 6);

    const run = await volunteer.json<Run>("GET", `/api/runs/${res.body.id}`);
    expect(run.status).toBe(200);
    expect(run.body.state).toBe("planned");
    expect(run.body.stopList.map((s) => s.dropPoint.id)).toEqual(res.body.order);
    expect(run.body.stopList.map((s) => s.position)).toEqual([1, 2, 3, 4]);
    expect(run.body.stopList[0]!.dropPoint.hours.length).toBeGreaterThan(0);

    const mail = await waitForMail(DEMO.volunteer, (m) => m.text.includes(`/runs/${res.body.id}`));
    expect(mail.subject).toBe("Pickup run on 10 Dec 2026: 4 stops");
    expect(mail.headers["x-cantrove-group"]).toBe(f.demoGroupId);
    for (const p of chosen) expect(mail.text).toContain(p.name);
  });

  it("refuses another group's drop point, a builder as driver, and an empty choice with 422", async () => {
    const foreign = await planRun([points[0]!.id, f.otherDropPointId]);
    expect(foreign.status).toBe(422);
    const builderId = (await testDb()("users").where({ email: DEMO.builder }).first()).id;
    const asBuilder = await organiser.json<{ error: { fields: Record<string, string> } }>("POST", "/api/runs", {
      driveId: f.demoDriveId, plannedOn: "2026-12-09", start: workshop, dropPointIds: [points[0]!.id], assigneeId: builderId,
    });
    expect(asBuilder.status).toBe(422);
    expect(asBuilder.body.error.fields.assigneeId).toMatch(/volunteer or organiser/);
    const empty = await organiser.json<{ error: { fields: Record<string, string> } }>("POST", "/api/runs", {
      driveId: f.demoDriveId, plannedOn: "2026-12-09", start: workshop, dropPointIds: [], assigneeId: volunteerId,
    });
    expect(empty.status).toBe(422);
    expect(empty.body.error.fields.dropPointIds).toBe("Choose at least one drop point");
  });

  it("keeps runs inside the group and away from builders", async () => {
    const res = await planRun([points[1]!.id]);
    expect((await other.json("GET", `/api/runs/${res.body.id}`)).status).toBe(404);
    expect((await builder.json("GET", `/api/runs/${res.body.id}`)).status).toBe(403);
    expect((await other.json("POST", `/api/runs/${res.body.id}/stops/${res.body.id}/skip`, { reason: "closed" })).status).toBe(404);
    const theirs = await other.json<{ id: string }[]>("GET", "/api/runs");
    expect(theirs.body.map((r) => r.id)).not.toContain(res.body.id);
  });

  it("ranks suggestions for the drive", async () => {
    const res = await organiser.json<{ id: string; suggested: boolean }[]>("GET", `/api/runs/suggestions?driveId=${f.demoDriveId}`);
    expect(res.status).toBe(200);
    expect(res.body.map((s) => s.id).sort()).toEqual(points.map((p) => p.id).sort());
  });
});

describe("following a run", () => {
  it("moves from planned to under way to done as stops are skipped, and refuses a second answer", async () => {
    const res = await planRun([points[2]!.id, points[3]!.id]);
    const run = (await volunteer.json<Run>("GET", `/api/runs/${res.body.id}`)).body;
    const [first, second] = run.stopList;
    const noReason = await volunteer.json<{ error: { fields: Record<string, string> } }>("POST", `/api/runs/${run.id}/stops/${first!.id}/skip`, { reason: " " });
    expect(noReason.status).toBe(422);
    expect(noReason.body.error.fields.reason).toMatch(/Say why/);

    const one = await volunteer.json<Run>("POST", `/api/runs/${run.id}/stops/${first!.id}/skip`, { reason: "Hall closed for a funeral" });
    expect(one.status).toBe(200);
    expect(one.body.state).toBe("under_way");
    expect(one.body.stopList[0]!.skipReason).toBe("Hall closed for a funeral");
    expect((await volunteer.json("POST", `/api/runs/${run.id}/stops/${first!.id}/skip`, { reason: "again" })).status).toBe(409);

    const two = await organiser.json<Run>("POST", `/api/runs/${run.id}/stops/${second!.id}/skip`, { reason: "Bin already emptied by the host" });
    expect(two.body.state).toBe("done");
    expect(two.body.skipped).toBe(2);
    const stored = await testDb()("pickup_runs").where({ id: run.id }).first();
    expect(stored.finished_at).not.toBeNull();
  });

  it("records a skip at the time it was entered (sent later from a phone with no signal), never ahead of the clock", async () => {
    const res = await planRun([points[0]!.id, points[1]!.id]);
    const run = (await volunteer.json<Run>("GET", `/api/runs/${res.body.id}`)).body;
    const [first, second] = run.stopList;
    const ahead = new Date(Date.now() + 3 * 3_600_000).toISOString();
    const refused = await volunteer.json<{ error: { fields: Record<string, string> } }>("POST", `/api/runs/${run.id}/stops/${first!.id}/skip`, { reason: "Gate locked", happenedAt: ahead });
    expect(refused.status).toBe(422);
    expect(Object.keys(refused.body.error.fields)).toEqual(["happenedAt"]);
    const entered = new Date(Date.now() - 40 * 60_000);
    entered.setMilliseconds(0);
    const ok = await volunteer.json<Run>("POST", `/api/runs/${run.id}/stops/${first!.id}/skip`, { reason: "Gate locked", happenedAt: entered.toISOString() });
    expect(ok.status).toBe(200);
    expect(ok.body.stopList.find((s) => s.id === first!.id)!.resolvedAt).toBe(entered.toISOString());
    // Without a time, the time it arrived.
    const before = Date.now();
    const now = await volunteer.json<Run>("POST", `/api/runs/${run.id}/stops/${second!.id}/skip`, { reason: "No parking" });
    expect(Date.parse(now.body.stopList.find((s) => s.id === second!.id)!.resolvedAt!)).toBeGreaterThanOrEqual(before - 1000);
  });

  it("will not mark a stop logged with a haul that does not exist", async () => {
    const res = await planRun([points[4]!.id]);
    const run = (await volunteer.json<Run>("GET", `/api/runs/${res.body.id}`)).body;
    const bad = await volunteer.json<{ error: { fields: Record<string, string> } }>("POST", `/api/runs/${run.id}/stops/${run.stopList[0]!.id}/log`, {
      haulId: "00000000-0000-4000-8000-000000000000",
    });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.haulId).toBeDefined();
  });
});
