import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";
import { totalsMismatches } from "@/tests/support/ledger-totals";
import type { ApiClient } from "@/tests/support/http";

// Property-based (fast-check): random sequences of valid ledger writes — hauls,
// sorts, processing with and without losses, claims, releases, built-in cans,
// recycling, stock counts and undos of any earlier entry — sent through the API.
// Whatever each write answers (201, or 409 when it would break a rule), after
// every sequence each running total (stage_balances with its drop-point and
// heater-unit rows, reject_tallies, drop_point_tallies, drive_daily_good,
// group_calibration) equals the sum of what it totals (tests/support/ledger-totals.ts).
const SEED = Number(process.env.LEDGER_TOTALS_SEED ?? Date.now() % 2 ** 31);
const RUNS = 10;

type Stock = { stages: Record<string, number>; rejected: Record<string, number>; rejectedOnHand: number; claimed: number; unclaimed: number };
const STEPS = [
  { from: "good", to: "washed", losses: ["damagedWashing"] },
  { from: "washed", to: "opened", losses: ["damagedWashing", "damagedOpening"] },
  { from: "opened", to: "punched", losses: ["damagedOpening", "damagedPunching"] },
] as const;
const COUNTABLE = ["good", "washed", "opened", "punched", "rejected"] as const;

const opArb = fc.oneof(
  { weight: 3, arbitrary: fc.record({ op: fc.constant("haul" as const), point: fc.nat(1), bags: fc.integer({ min: 1, max: 3 }) }) },
  { weight: 3, arbitrary: fc.record({ op: fc.constant("sort" as const), pick: fc.nat(), good: fc.integer({ min: 20, max: 200 }), dented: fc.nat(8), crushed: fc.nat(4) }) },
  {
    weight: 5,
    arbitrary: fc.record({
      op: fc.constant("process" as const),
      step: fc.nat(2),
      quantity: fc.integer({ min: 0, max: 60 }),
      lost: fc.option(fc.record({ pick: fc.nat(1), quantity: fc.integer({ min: 1, max: 6 }) }), { freq: 2 }),
    }),
  },
  { weight: 2, arbitrary: fc.record({ op: fc.constantFrom("claim" as const, "release" as const, "builtIn" as const), unit: fc.nat(1), quantity: fc.integer({ min: 1, max: 50 }) }) },
  { weight: 1, arbitrary: fc.record({ op: fc.constant("recycle" as const), quantity: fc.integer({ min: 1, max: 10 }) }) },
  { weight: 3, arbitrary: fc.record({ op: fc.constant("count" as const), deltas: fc.array(fc.tuple(fc.constantFrom(...COUNTABLE), fc.integer({ min: -25, max: 25 })), { minLength: 1, maxLength: 4 }) }) },
  // Undo the `back`-th latest entry of a kind (or of any kind) not undone yet.
  { weight: 3, arbitrary: fc.record({ op: fc.constant("undo" as const), of: fc.constantFrom("any", "loss", "stockCount"), back: fc.nat(3) }) },
);
type Op = typeof opArb extends fc.Arbitrary<infer T> ? T : never;

let g: FreshGroup;
let vol: ApiClient;
let org: ApiClient;
let bld: ApiClient;
const movements: { id: string; kind: string; undone?: boolean }[] = [];
const done: Record<string, number> = {};

beforeAll(async () => {
  g = await freshGroup("totals");
  [vol, org, bld] = await Promise.all([g.client("volunteer"), g.client("organiser"), g.client("builder")]);
});
afterAll(closeTestDb);

/** Sends one operation; returns its status, or null when the state gives it nothing to act on. */
async function run(op: Op): Promise<{ status: number; kind: string; body: unknown } | null> {
  const d = `/api/drives/${g.driveId}`;
  const send = async (who: ApiClient, path: string, body: unknown, kind: string) => {
    const r = await who.json<{ movementId?: string }>("POST", path, body);
    return { status: r.status, kind, body: r.body };
  };
  switch (op.op) {
    case "haul":
      return send(vol, `${d}/hauls`, { dropPointId: g.dropPointIds[op.point], bags: op.bags }, "haul");
    case "sort": {
      const open = (await vol.json<{ id: string }[]>("GET", `${d}/hauls?open=1`)).body;
      if (open.length === 0) return null;
      return send(vol, `${d}/sorts`, { haulIds: [open[op.pick % open.length].id], good: op.good, rejected: { dented: op.dented, crushed: op.crushed } }, "sort");
    }
    case "process": {
      const s = STEPS[op.step];
      if (op.quantity === 0 && !op.lost) return null;
      const lost = op.lost ? { reason: s.losses[op.lost.pick % s.losses.length], quantity: op.lost.quantity } : undefined;
      return send(vol, `${d}/processing`, { from: s.from, to: s.to, quantity: op.quantity, ...(lost ? { lost } : {}) }, lost ? "loss" : "processing");
    }
    case "claim":
    case "release":
    case "builtIn": {
      const path = { claim: "claims", release: "releases", builtIn: "built-in" }[op.op];
      return send(bld, `/api/heaters/${g.heaterIds[op.unit]}/${path}`, { quantity: op.quantity }, op.op);
    }
    case "recycle":
      return send(vol, `${d}/recycling`, { quantity: op.quantity }, "recycling");
    case "count": {
      const st = (await org.json<Stock>("GET", `${d}/stock`)).body;
      const have: Record<string, number> = { ...st.stages, rejected: st.rejectedOnHand };
      const expected: Record<string, number> = {};
      const counted: Record<string, number> = {};
      for (const [stage, delta] of op.deltas) {
        expected[stage] = have[stage];
        counted[stage] = Math.max(0, have[stage] + delta);
      }
      if (Object.keys(counted).every((k) => counted[k] === expected[k])) return null;
      return send(org, `${d}/stock-counts`, { counted, expected, reason: "Random recount" }, "stockCount");
    }
    case "undo": {
      const open = movements.filter((m) => !m.undone && (op.of === "any" || m.kind === op.of));
      if (open.length === 0) return null;
      const target = open[open.length - 1 - (op.back % open.length)];
      const r = await send(org, `/api/movements/${target.id}/reversal`, undefined, `undo ${target.kind}`);
      if (r.status === 201) target.undone = true;
      return r;
    }
  }
}

describe("running totals after random ledger sequences (property-based)", () => {
  it("keeps every total equal to the sum of its ledger lines, with losses, stock counts and undos", async () => {
    console.log(`[ledger-totals] seed ${SEED} (LEDGER_TOTALS_SEED=${SEED} repeats this run)`);
    await fc.assert(
      fc.asyncProperty(fc.array(opArb, { minLength: 8, maxLength: 20 }), async (ops) => {
        for (const op of ops) {
          const r = await run(op);
          if (!r) continue;
          expect([201, 409], `${JSON.stringify(op)} → ${r.status} ${JSON.stringify(r.body)}`).toContain(r.status);
          if (r.status !== 201) continue;
          done[r.kind] = (done[r.kind] ?? 0) + 1;
          const id = (r.body as { movementId?: string }).movementId;
          if (id && !r.kind.startsWith("undo")) movements.push({ id, kind: r.kind });
        }
        expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
        const s = (await org.json<Stock>("GET", `/api/drives/${g.driveId}/stock`)).body;
        expect(s.unclaimed).toBe(s.stages.good + s.stages.washed + s.stages.opened + s.stages.punched - s.claimed);
        expect(s.unclaimed).toBeGreaterThanOrEqual(0);
      }),
      {
        numRuns: RUNS,
        seed: SEED,
        endOnFailure: true,
        // Always first: one sequence that surely records, counts and undoes a loss and a count.
        examples: [
          [
            [
              { op: "haul", point: 0, bags: 2 },
              { op: "sort", pick: 0, good: 150, dented: 3, crushed: 1 },
              { op: "process", step: 0, quantity: 50, lost: { pick: 0, quantity: 4 } },
              { op: "count", deltas: [["washed", -3], ["good", 2], ["rejected", -1]] },
              { op: "process", step: 1, quantity: 20, lost: { pick: 1, quantity: 2 } },
              { op: "undo", of: "loss", back: 1 },
              { op: "undo", of: "stockCount", back: 0 },
              { op: "undo", of: "loss", back: 0 },
            ],
          ],
        ],
      },
    );
    console.log(`[ledger-totals] accepted: ${JSON.stringify(done)}`);
    // The sequences really exercised what they are about (and losses really reached the ledger).
    for (const kind of ["sort", "loss", "stockCount", "undo loss", "undo stockCount"]) expect(done[kind] ?? 0, kind).toBeGreaterThan(0);
    const lossLines = await testDb()("ledger_lines").where({ group_id: g.groupId }).whereIn("reason", ["damagedWashing", "damagedOpening", "damagedPunching"]).count({ n: "*" }).first();
    expect(Number(lossLines?.n)).toBeGreaterThan(0);
  }, 240_000);

  it("finds a total that drifts from its lines (the check can fail)", async () => {
    const db = testDb();
    const row = await db("reject_tallies").where({ group_id: g.groupId }).whereNull("drop_point_id").first();
    expect(row).toBeTruthy();
    await db("reject_tallies").where({ drive_id: row.drive_id, reason: row.reason }).whereNull("drop_point_id").increment("quantity", 1);
    try {
      expect(await totalsMismatches(db, g.groupId)).toEqual([expect.stringMatching(new RegExp(`^reject_tallies .*${row.reason}`))]);
    } finally {
      await db("reject_tallies").where({ drive_id: row.drive_id, reason: row.reason }).whereNull("drop_point_id").decrement("quantity", 1);
    }
  });
});
