import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";
import { totalsMismatches } from "@/tests/support/ledger-totals";
import type { ApiClient } from "@/tests/support/http";

// The writes that once held the drive's lock across round trips from Node are
// one database call each now, re-checking under the lock what Node read
// before it. These races show the re-checks hold: two moves of one unit, two
// hauls at one stop, a haul and a log at one stop, two stops of one run.
// Each race runs a few rounds, since which request wins changes from round to round.
const ROUNDS = 5;

type Err = { error: { code: string; message: string } };
type Moved = { state: string; released: number } & Partial<Err>;
interface Run {
  id: string;
  state: string;
  logged: number;
  stopList: { id: string; status: string; haulId: string | null; dropPoint: { id: string } }[];
}

let g: FreshGroup;
let org: ApiClient;
let vol: ApiClient;
let bld: ApiClient;
let volunteerId: string;

beforeAll(async () => {
  g = await freshGroup("lock-free");
  [org, vol, bld] = await Promise.all([g.client("organiser"), g.client("volunteer"), g.client("builder")]);
  volunteerId = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
  await haulAndSort(vol, g.driveId, g.dropPointIds[0]!, 600);
});
afterAll(closeTestDb);

const move = (c: ApiClient, id: string, state: string) => c.json<Moved>("POST", `/api/heaters/${id}/state`, { state });
const unitRow = (id: string) => testDb()("heater_units").where({ id }).first();
const claimedOf = async (id: string) =>
  Number((await testDb()("stage_balances").where({ heater_unit_id: id, stage: "claimed" }).sum({ q: "quantity" }).first())?.q ?? 0);
const releasesOf = async (id: string) =>
  Number((await testDb()("movements").where({ group_id: g.groupId, kind: "release" }).whereRaw("details->>'heaterUnitId' = ?", [id]).count({ n: "*" }).first())?.n);

describe("two moves of one unit at once", () => {
  it("installing twice: exactly one wins and gives the unbuilt claim back once, the other is 409", async () => {
    const id = g.heaterIds[0]!;
    for (let round = 0; round < ROUNDS; round++) {
      // Back to building with 10 claimed cans (an organiser steps an installed unit back one step).
      if (round > 0) expect((await move(org, id, "building")).status).toBe(200);
      expect((await bld.json("POST", `/api/heaters/${id}/claims`, { quantity: 10 }, { "Idempotency-Key": randomUUID() })).status).toBe(201);
      if (round === 0) expect((await move(bld, id, "building")).status).toBe(200);
      const releasesBefore = await releasesOf(id);

      const answers = await Promise.all([move(bld, id, "installed"), move(org, id, "installed")]);
      const seen = JSON.stringify(answers.map((a) => a.body));
      expect(answers.map((a) => a.status).sort(), `round ${round}: ${seen}`).toEqual([200, 409]);
      expect(answers.find((a) => a.status === 200)!.body).toMatchObject({ state: "installed", released: 10 });
      // The loser is told what the rule says from the state it finds now (lib/heaters/states.ts).
      expect(answers.find((a) => a.status === 409)!.body.error).toMatchObject({ code: "conflict", message: "The unit is already at “On the wall”." });
      expect((await unitRow(id)).state).toBe("installed");
      expect(await claimedOf(id)).toBe(0);
      expect(await releasesOf(id)).toBe(releasesBefore + 1);
    }
    expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
  }, 120_000);

  it("two forward moves from one state: the rule is applied again to the state the other left", async () => {
    const id = g.heaterIds[1]!;
    for (let round = 0; round < ROUNDS; round++) {
      await testDb()("heater_units").where({ id }).update({ state: "planned" });
      const [toClaiming, toBuilding] = await Promise.all([move(bld, id, "claiming"), move(bld, id, "building")]);
      const final = (await unitRow(id)).state;
      const seen = `round ${round}: ${JSON.stringify([toClaiming.body, toBuilding.body])}`;
      // building is forward of both planned and claiming, so it always succeeds; the move to
      // claiming succeeds only if it came first, else a builder may not step back (409).
      expect(toBuilding.status, seen).toBe(200);
      expect(final, seen).toBe("building");
      if (toClaiming.status === 409) {
        expect(toClaiming.body.error?.message, seen).toBe("Only an organiser can move a unit back.");
      } else {
        expect(toClaiming.status, seen).toBe(200);
      }
    }
  }, 120_000);
});

async function newRun(dropPointIds: string[]): Promise<Run> {
  const created = await org.json<{ id: string }>("POST", "/api/runs", {
    driveId: g.driveId,
    plannedOn: "2026-12-14",
    start: { lat: 47.19, lng: -8 },
    dropPointIds,
    assigneeId: volunteerId,
  });
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  return (await vol.json<Run>("GET", `/api/runs/${created.body.id}`)).body;
}

const haulAt = (run: Run, i: number, bags: number) =>
  vol.json<{ haul: { id: string }; run: Run } & Partial<Err>>("POST", `/api/runs/${run.id}/stops/${run.stopList[i]!.id}/haul`, { bags }, { "Idempotency-Key": randomUUID() });
const haulCount = async () => Number((await testDb()("hauls").where({ group_id: g.groupId }).count({ n: "*" }).first())?.n);

describe("logging at pickup-run stops at once", () => {
  it("two hauls at one stop: one settles it, the other is 409 and leaves no haul behind", async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const run = await newRun([g.dropPointIds[1]!]);
      const before = await haulCount();
      const answers = await Promise.all([haulAt(run, 0, 1), haulAt(run, 0, 2)]);
      const seen = `round ${round}: ${JSON.stringify(answers.map((a) => a.body))}`;
      expect(answers.map((a) => a.status).sort(), seen).toEqual([201, 409]);
      const won = answers.find((a) => a.status === 201)!.body;
      expect(answers.find((a) => a.status === 409)!.body.error, seen).toMatchObject({ code: "conflict", message: "This stop is already logged." });
      expect(await haulCount()).toBe(before + 1);
      const stop = await testDb()("pickup_run_stops").where({ id: run.stopList[0]!.id }).first();
      expect(stop).toMatchObject({ status: "logged", haul_id: won.haul.id });
      expect(won.run.state).toBe("done");
      expect((await testDb()("pickup_runs").where({ id: run.id }).first()).state).toBe("done");
    }
    expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
  }, 120_000);

  it("a haul logged at a stop while another request logs an existing haul there: one settles it", async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const run = await newRun([g.dropPointIds[1]!]);
      const existing = await vol.json<{ id: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[1], bags: 1 });
      expect(existing.status).toBe(201);
      const [atStop, logged] = await Promise.all([
        haulAt(run, 0, 1),
        vol.json<Partial<Err>>("POST", `/api/runs/${run.id}/stops/${run.stopList[0]!.id}/log`, { haulId: existing.body.id }),
      ]);
      const seen = `round ${round}: ${JSON.stringify([atStop.body, logged.body])}`;
      expect([atStop.status, logged.status].sort(), seen).toEqual(atStop.status === 201 ? [201, 409] : [200, 409]);
      const stop = await testDb()("pickup_run_stops").where({ id: run.stopList[0]!.id }).first();
      expect(stop.haul_id, seen).toBe(atStop.status === 201 ? atStop.body.haul.id : existing.body.id);
      const refused = atStop.status === 409 ? atStop.body : logged.body;
      expect(refused.error?.message, seen).toBe("This stop is already logged.");
    }
  }, 120_000);

  it("hauls at two stops of one run at once: both settle, and the run ends done with both counted", async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const run = await newRun(g.dropPointIds);
      const answers = await Promise.all([haulAt(run, 0, 1), haulAt(run, 1, 1)]);
      const seen = `round ${round}: ${JSON.stringify(answers.map((a) => a.body))}`;
      expect(answers.map((a) => a.status), seen).toEqual([201, 201]);
      // Each answer shows the run as its own call left it: one saw the other stop settled, one did not.
      expect(answers.map((a) => `${a.body.run.state}:${a.body.run.logged}`).sort(), seen).toEqual(["done:2", "under_way:1"]);
      const row = await testDb()("pickup_runs").where({ id: run.id }).first();
      expect(row.state).toBe("done");
      expect(row.started_at).not.toBeNull();
      expect(row.finished_at).not.toBeNull();
    }
    expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
  }, 120_000);
});
