import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import turfDistance from "@turf/distance";
import { testDb } from "@/tests/support/db";
import { DEMO } from "@/tests/support/env";
import { signedIn, type ApiClient } from "@/tests/support/http";
import { dayFromToday, freshGroupForFile } from "@/tests/support/ledger";
import { mailTo, waitForMail } from "@/tests/support/mail";
import { calendarDateIn } from "@/lib/drives/opening-hours";

// Issue 16, runs: edit (date, volunteer, stops by hand or re-optimised), cancel, and the
// warnings that never block. A group of its own, so its mail addresses and runs are only these.

interface Stop {
  id: string;
  position: number;
  legKm: number;
  status: string;
  haulId: string | null;
  haul: { movementId: string } | null;
  dropPoint: { id: string; name: string; lat: number; lng: number; openingHours: unknown[] };
  openOnRunDay: boolean | null;
}
interface Run {
  id: string;
  state: string;
  plannedOn: string;
  assigneeId: string;
  distanceKm: number;
  cancelledAt: string | null;
  cancelReason: string | null;
  stopList: Stop[];
  warnings: { kind: string; stopId?: string; message: string }[];
}

const g = freshGroupForFile("run-edit");
const START = { lat: 47.19, lng: -8.0 };
let org: ApiClient;
let vol: ApiClient;
let builder: ApiClient;
let otherOrg: ApiClient;
let points: { id: string; name: string; lat: number; lng: number }[];
let ids: { volunteer: string; volunteer2: string; builder: string };

beforeAll(async () => {
  const db = testDb();
  // Four more drop points around the start, so an order can be good or bad.
  const extra = [
    { name: "East shed", lat: 47.205, lng: -7.97 },
    { name: "West chapel", lat: 47.2, lng: -8.04 },
    { name: "Mill yard", lat: 47.23, lng: -8.01 },
    { name: "Quay kiosk", lat: 47.18, lng: -7.99 },
  ];
  for (const p of extra) await db("drop_points").insert({ group_id: g.groupId, drive_id: g.driveId, ...p });
  points = await db("drop_points").select("id", "name", "lat", "lng").where({ drive_id: g.driveId }).orderBy("name");
  const user = async (email: string) => (await db("users").where({ email }).first()).id as string;
  ids = { volunteer: await user(g.emails.volunteer), volunteer2: await user(g.emails.volunteer2), builder: await user(g.emails.builder) };
  org = await g.client("organiser");
  vol = await g.client("volunteer");
  builder = await g.client("builder");
  otherOrg = await signedIn(DEMO.organiser); // an organiser, but of another group
});

async function planRun(dropPointIds: string[], plannedOn = dayFromToday(10)) {
  const res = await org.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn, start: START, dropPointIds, assigneeId: ids.volunteer });
  expect(res.status).toBe(201);
  return (await org.json<Run>("GET", `/api/runs/${res.body.id}`)).body;
}

/** Reference: @turf/distance (haversine, mean Earth radius) along the order from the start. */
function turfLength(order: { lat: number; lng: number }[]) {
  let km = 0;
  let prev = START;
  for (const p of order) {
    km += turfDistance([prev.lng, prev.lat], [p.lng, p.lat]);
    prev = p;
  }
  return km;
}

const outboxCount = async (to: string) => Number((await testDb()("outbox").where({ to_address: to }).count({ n: "*" }).first())?.n);
const lineCount = async () => Number((await testDb()("ledger_lines").where({ group_id: g.groupId }).count({ n: "*" }).first())?.n);

describe("editing a run's date and volunteer", () => {
  it("moves the day, gives the run to another volunteer and mails both; the same change again mails nobody", async () => {
    const run = await planRun([points[0]!.id, points[1]!.id]);
    const newDay = dayFromToday(12);
    const res = await org.json<Run>("PATCH", `/api/runs/${run.id}`, { plannedOn: newDay, assigneeId: ids.volunteer2 });
    expect(res.status).toBe(200);
    expect(res.body.plannedOn).toBe(newDay);
    expect(res.body.assigneeId).toBe(ids.volunteer2);

    const given = await waitForMail(g.emails.volunteer2, (m) => m.text.includes(`/runs/${run.id}`));
    expect(given.subject).toMatch(/^Pickup run on .*: 2 stops$/);
    const takenOff = await waitForMail(g.emails.volunteer, (m) => m.subject.includes("given to someone else"));
    expect(takenOff.text).toContain("You do not need to do this run");

    const before = [await outboxCount(g.emails.volunteer), await outboxCount(g.emails.volunteer2)];
    const again = await org.json<Run>("PATCH", `/api/runs/${run.id}`, { plannedOn: newDay, assigneeId: ids.volunteer2 });
    expect(again.status).toBe(200);
    expect([await outboxCount(g.emails.volunteer), await outboxCount(g.emails.volunteer2)]).toEqual(before);

    // The old volunteer no longer sees it; the new one does.
    expect((await vol.json("GET", `/api/runs/${run.id}`)).status).toBe(404);
    const vol2 = await g.client("volunteer2");
    expect((await vol2.json("GET", `/api/runs/${run.id}`)).status).toBe(200);
  });

  it("mails the volunteer the new day when only the date moves", async () => {
    const run = await planRun([points[2]!.id]);
    const res = await org.json<Run>("PATCH", `/api/runs/${run.id}`, { plannedOn: dayFromToday(14) });
    expect(res.status).toBe(200);
    const moved = await waitForMail(g.emails.volunteer, (m) => m.subject.startsWith("Pickup run moved to") && m.text.includes(`/runs/${run.id}`));
    expect(moved.text).toContain("has moved your pickup run");
  });

  it("refuses a builder as driver, an empty change and a bad day with 422", async () => {
    const run = await planRun([points[0]!.id]);
    const asBuilder = await org.json<{ error: { fields: Record<string, string> } }>("PATCH", `/api/runs/${run.id}`, { assigneeId: ids.builder });
    expect(asBuilder.status).toBe(422);
    expect(asBuilder.body.error.fields.assigneeId).toMatch(/volunteer or organiser/);
    expect((await org.json("PATCH", `/api/runs/${run.id}`, {})).status).toBe(422);
    expect((await org.json("PATCH", `/api/runs/${run.id}`, { plannedOn: "2027-02-30" })).status).toBe(422);
    expect((await org.json("PATCH", `/api/runs/${run.id}`, { driveId: g.driveId })).status).toBe(422);
  });
});

describe("editing a run's stops", () => {
  it("adds, removes and reorders by hand, with legs and length as @turf/distance measures them", async () => {
    const run = await planRun([points[0]!.id, points[1]!.id, points[2]!.id]);
    const order = [points[3]!.id, run.stopList[2]!.dropPoint.id, run.stopList[0]!.dropPoint.id]; // add 3, drop the middle, reverse
    const res = await org.json<Run>("PUT", `/api/runs/${run.id}/stops`, { dropPointIds: order });
    expect(res.status).toBe(200);
    expect(res.body.stopList.map((s) => s.dropPoint.id)).toEqual(order);
    expect(res.body.stopList.map((s) => s.position)).toEqual([1, 2, 3]);
    const byId = new Map(points.map((p) => [p.id, p]));
    const placed = order.map((id) => byId.get(id)!);
    expect(res.body.distanceKm).toBeCloseTo(turfLength(placed), 6);
    expect(res.body.stopList[0]!.legKm).toBeCloseTo(turfDistance([START.lng, START.lat], [placed[0]!.lng, placed[0]!.lat]), 6);
    // Kept stops keep their id (and so their history); the new one is new.
    expect(res.body.stopList[2]!.id).toBe(run.stopList[0]!.id);
    expect(Number((await testDb()("pickup_run_stops").where({ run_id: run.id }).count({ n: "*" }).first())?.n)).toBe(3);
  });

  it("re-optimises to the shortest order (checked against every order, by @turf/distance)", async () => {
    const chosen = points.slice(0, 5);
    const run = await planRun(chosen.map((p) => p.id));
    // A deliberately poor order first.
    const poor = [...run.stopList].reverse().map((s) => s.dropPoint.id);
    [poor[0], poor[2]] = [poor[2]!, poor[0]!];
    await org.json("PUT", `/api/runs/${run.id}/stops`, { dropPointIds: poor });
    const res = await org.json<Run>("POST", `/api/runs/${run.id}/optimise`, {}, { "Idempotency-Key": randomUUID() });
    expect(res.status).toBe(200);
    let best = Infinity;
    const permute = (rest: typeof chosen, acc: typeof chosen) => {
      if (rest.length === 0) best = Math.min(best, turfLength(acc));
      rest.forEach((p, i) => permute([...rest.slice(0, i), ...rest.slice(i + 1)], [...acc, p]));
    };
    permute(chosen, []);
    expect(res.body.distanceKm).toBeCloseTo(best, 6);
  });

  it("keeps a logged stop on the run: removing it is 409, re-optimising leaves it first", async () => {
    const run = await planRun([points[0]!.id, points[1]!.id, points[2]!.id]);
    const last = run.stopList[2]!;
    const haul = await vol.json("POST", `/api/runs/${run.id}/stops/${last.id}/haul`, { bags: 2 });
    expect(haul.status).toBe(201);
    const drop = await org.json("PUT", `/api/runs/${run.id}/stops`, { dropPointIds: run.stopList.slice(0, 2).map((s) => s.dropPoint.id) });
    expect(drop.status).toBe(409);
    const opt = await org.json<Run>("POST", `/api/runs/${run.id}/optimise`, {});
    expect(opt.status).toBe(200);
    expect(opt.body.stopList[0]!.id).toBe(last.id);
    expect(opt.body.stopList[0]!.status).toBe("logged");
  });

  it("refuses another group's drop point (422) and a point listed twice (422)", async () => {
    const run = await planRun([points[0]!.id]);
    const foreign = await testDb()("drop_points").whereNot({ group_id: g.groupId }).first("id");
    expect((await org.json("PUT", `/api/runs/${run.id}/stops`, { dropPointIds: [points[0]!.id, foreign.id] })).status).toBe(422);
    expect((await org.json("PUT", `/api/runs/${run.id}/stops`, { dropPointIds: [points[0]!.id, points[0]!.id] })).status).toBe(422);
    // An archived drop point is out of every plan: it cannot be added as a new stop either.
    const archived = points[1]!.id;
    expect((await org.json("POST", `/api/drop-points/${archived}/archive`, {})).status).toBe(200);
    try {
      expect((await org.json("PUT", `/api/runs/${run.id}/stops`, { dropPointIds: [points[0]!.id, archived] })).status).toBe(404);
    } finally {
      expect((await org.json("POST", `/api/drop-points/${archived}/restore`, {})).status).toBe(200);
    }
  });
});

describe("cancelling a run", () => {
  it("keeps the run and its logged haul, releases the rest, mails the volunteer and then refuses every change (409)", async () => {
    const run = await planRun([points[0]!.id, points[1]!.id, points[2]!.id]);
    const first = run.stopList[0]!;
    const haul = await vol.json<{ run: Run }>("POST", `/api/runs/${run.id}/stops/${first.id}/haul`, { bags: 3 });
    expect(haul.status).toBe(201);
    const movementId = haul.body.run.stopList[0]!.haul!.movementId;
    const lines = await lineCount();

    const key = randomUUID();
    const res = await org.json<Run>("POST", `/api/runs/${run.id}/cancel`, { reason: "Van broke down" }, { "Idempotency-Key": key });
    expect(res.status).toBe(200);
    expect(res.body.state).toBe("cancelled");
    expect(res.body.cancelReason).toBe("Van broke down");
    expect(res.body.cancelledAt).not.toBeNull();
    expect(res.body.stopList.map((s) => s.status)).toEqual(["logged", "released", "released"]);
    expect(res.body.stopList[0]!.haulId).not.toBeNull();
    expect(await lineCount()).toBe(lines); // the ledger is not touched
    const replay = await org.json<Run>("POST", `/api/runs/${run.id}/cancel`, { reason: "Van broke down" }, { "Idempotency-Key": key });
    expect(replay.status).toBe(200);
    expect(replay.body).toEqual(res.body);

    const mail = await waitForMail(g.emails.volunteer, (m) => m.subject.endsWith("cancelled") && m.text.includes(`/runs/${run.id}`));
    expect(mail.text).toContain("Reason: Van broke down");

    const released = res.body.stopList[1]!.id;
    const refusals = await Promise.all([
      org.json("POST", `/api/runs/${run.id}/cancel`, { reason: "again please" }),
      org.json("PATCH", `/api/runs/${run.id}`, { plannedOn: dayFromToday(20) }),
      org.json("PUT", `/api/runs/${run.id}/stops`, { dropPointIds: [points[0]!.id] }),
      org.json("POST", `/api/runs/${run.id}/optimise`, {}),
      vol.json("POST", `/api/runs/${run.id}/stops/${released}/skip`, { reason: "cancelled anyway" }),
      vol.json("POST", `/api/runs/${run.id}/stops/${released}/haul`, { bags: 1 }),
    ]);
    expect(refusals.map((r) => r.status)).toEqual([409, 409, 409, 409, 409, 409]);

    // Still listed, as cancelled; the volunteer still sees it.
    const list = await org.json<{ id: string; state: string }[]>("GET", "/api/runs");
    expect(list.body.find((r) => r.id === run.id)?.state).toBe("cancelled");
    expect((await vol.json<Run>("GET", `/api/runs/${run.id}`)).body.state).toBe("cancelled");

    // Undoing the logged haul is an ordinary reversal: the ledger grows, the stop is released, the run stays cancelled.
    const undo = await org.json("POST", `/api/movements/${movementId}/reversal`, undefined, { "idempotency-key": randomUUID() });
    expect(undo.status).toBe(201);
    expect(await lineCount()).toBeGreaterThan(lines);
    const after = (await org.json<Run>("GET", `/api/runs/${run.id}`)).body;
    expect(after.state).toBe("cancelled");
    expect(after.stopList[0]!.status).toBe("released");
  });

  it("refuses to cancel or edit a finished run (409) and wants a reason (422)", async () => {
    const run = await planRun([points[4]!.id]);
    expect((await org.json("POST", `/api/runs/${run.id}/cancel`, { reason: " " })).status).toBe(422);
    await vol.json("POST", `/api/runs/${run.id}/stops/${run.stopList[0]!.id}/skip`, { reason: "Bin already emptied" });
    expect((await org.json<Run>("GET", `/api/runs/${run.id}`)).body.state).toBe("done");
    expect((await org.json("POST", `/api/runs/${run.id}/cancel`, { reason: "Too late" })).status).toBe(409);
    expect((await org.json("PATCH", `/api/runs/${run.id}`, { notes: "late note" })).status).toBe(409);
  });
});

describe("who may edit or cancel", () => {
  it("lets only the group's organisers: the run's own volunteer and the builder 403, another group's organiser 404", async () => {
    const run = await planRun([points[0]!.id, points[1]!.id]);
    const calls: [string, string, unknown][] = [
      ["PATCH", `/api/runs/${run.id}`, { notes: "mine now" }],
      ["PUT", `/api/runs/${run.id}/stops`, { dropPointIds: [points[1]!.id] }],
      ["POST", `/api/runs/${run.id}/optimise`, {}],
      ["POST", `/api/runs/${run.id}/cancel`, { reason: "not yours" }],
    ];
    for (const [method, path, body] of calls) {
      expect((await vol.json(method, path, body)).status, `${method} ${path} as the volunteer`).toBe(403);
      expect((await builder.json(method, path, body)).status, `${method} ${path} as a builder`).toBe(403);
      expect((await otherOrg.json(method, path, body)).status, `${method} ${path} as another group's organiser`).toBe(404);
    }
    const stored = (await org.json<Run>("GET", `/api/runs/${run.id}`)).body;
    expect(stored.state).toBe("planned");
    expect(stored.stopList).toHaveLength(2);
  });
});

describe("warnings, never blocks", () => {
  it("warns of a stop closed on the run's weekday and lets the run stand", async () => {
    const db = testDb();
    const [weekend] = await db("drop_points")
      .insert({ group_id: g.groupId, drive_id: g.driveId, name: "Weekend market hut", lat: 47.21, lng: -8.02, opening_hours: JSON.stringify([{ days: [6, 7], opens: "09:00", closes: "13:00" }]) })
      .returning("id");
    // 2027-01-07 is a Thursday (ISO 8601 weekday 4); 2027-01-09 a Saturday (6).
    const created = await org.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn: "2027-01-07", start: START, dropPointIds: [weekend.id, points[0]!.id], assigneeId: ids.volunteer });
    expect(created.status).toBe(201);
    const run = (await org.json<Run>("GET", `/api/runs/${created.body.id}`)).body;
    const hut = run.stopList.find((s) => s.dropPoint.id === weekend.id)!;
    expect(hut.openOnRunDay).toBe(false);
    expect(run.stopList.find((s) => s.dropPoint.id === points[0]!.id)!.openOnRunDay).toBeNull(); // no hours recorded: no warning
    expect(run.warnings).toEqual([{ kind: "closedOnRunDay", stopId: hut.id, message: "Weekend market hut is not open on Thursdays by its opening hours." }]);
    const moved = await org.json<Run>("PATCH", `/api/runs/${run.id}`, { plannedOn: "2027-01-09" });
    expect(moved.body.warnings).toEqual([]);
    expect(moved.body.stopList.find((s) => s.id === hut.id)!.openOnRunDay).toBe(true);
  });

  it("warns when a haul is logged on another day than the run's, and not on the run's day", async () => {
    const zone = (await testDb()("groups").where({ id: g.groupId }).first()).time_zone as string;
    const future = await planRun([points[0]!.id], dayFromToday(3));
    const off = await vol.json<{ warnings: { kind: string }[] }>("POST", `/api/runs/${future.id}/stops/${future.stopList[0]!.id}/haul`, { bags: 1 });
    expect(off.status).toBe(201);
    expect(off.body.warnings.map((w) => w.kind)).toEqual(["haulOffRunDay"]);
    const today = await planRun([points[1]!.id], calendarDateIn(new Date(), zone));
    const on = await vol.json<{ warnings: unknown[] }>("POST", `/api/runs/${today.id}/stops/${today.stopList[0]!.id}/haul`, { bags: 1 });
    expect(on.status).toBe(201);
    expect(on.body.warnings).toEqual([]);
  });
});

it("sends mail only to the people concerned (no stray copies)", async () => {
  const all = await mailTo(g.emails.builder);
  expect(all.filter((m) => /Pickup run/.test(m.subject))).toEqual([]);
});
