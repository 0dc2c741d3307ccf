import { describe, expect, it } from "vitest";
import { compare, roundOrder } from "@/scripts/bench/compare";
import type { LoadResult, LoadTarget } from "@/scripts/bench/load";

// The bench's side-by-side method (scripts/bench/compare.ts), with a made-up
// load in place of autocannon: each run's requests/s is the side's own speed
// times what a neighbour's job leaves of the machine at that moment.
const target = (name: string): LoadTarget => ({ name, method: "GET", path: "/" });
const sides = (names: string[]) => [
  { label: "A", base: "a", targets: names.map(target) },
  { label: "B", base: "b", targets: names.map(target) },
] as const;

/** A fake load: `speed[side]` requests/s on an idle machine; `machine(run)` the share left by others on the run-th run. */
function fakeLoad(speed: Record<string, number>, machine: (run: number) => number) {
  let run = 0;
  return async (base: string, t: LoadTarget, o: { seconds: number }): Promise<LoadResult> => {
    const rps = speed[base] * machine(run++);
    return { name: t.name, path: t.path, method: t.method, requests: rps * o.seconds, seconds: o.seconds, rps, p50: 1, p95: 2, p99: 3, max: 4, non2xx: 0, errors: 0, timeouts: 0, statuses: { 200: rps * o.seconds } };
  };
}

const opts = { rounds: 6, seconds: 1, warmup: 0, connections: 1, log: () => {} };

describe("bench comparison: interleaved A B B A rounds, median of the rounds", () => {
  it("each round runs each side twice, and two rounds put each side at each place once", () => {
    for (const r of [0, 1, 2, 3]) expect([...roundOrder(r)].sort()).toEqual([0, 0, 1, 1]);
    const places = [0, 1, 2, 3].map((i) => roundOrder(0)[i] + roundOrder(1)[i]);
    expect(places).toEqual([1, 1, 1, 1]);
  });

  it("two equal sides come out at 1 while the machine gets steadily busier (a plain A-then-B order would not)", async () => {
    const drift = (run: number) => 1 - run * 0.01; // 1 % less machine per run
    const [a, b] = sides(["floor"]);
    const c = await compare(a, b, { ...opts, load: fakeLoad({ a: 500, b: 500 }, drift) });
    expect(c.endpoints[0].ratio).toBeCloseTo(1, 6);
    expect(c.endpoints[0].spread[0]).toBeCloseTo(1, 6);
    // The same drift measured A then B in each round: B always later, always "slower".
    const ab = [0, 1, 2, 3, 4, 5].map((k) => drift(2 * k + 1) / drift(2 * k));
    expect(Math.max(...ab)).toBeLessThan(0.995);
  });

  it("a side 10 % slower comes out at 0.9, and one round hit by a neighbour does not decide it", async () => {
    // Run 9 (round 2 of the floor, one of its A runs) gets a third of the machine.
    const [a, b] = sides(["floor", "stock"]);
    const c = await compare(a, b, { ...opts, load: fakeLoad({ a: 1000, b: 900 }, (run) => (run === 9 ? 0.33 : 1)) });
    for (const e of c.endpoints) {
      expect(e.ratio).toBeCloseTo(0.9, 6);
      expect(e.rounds).toHaveLength(6);
    }
    expect(c.endpoints[0].spread[1]).toBeGreaterThan(1.3); // the disturbed round is there, and shown
    expect(c.endpoints[1].spread).toEqual([0.9, 0.9]);
    expect(c.endpoints[1].ratioVsFloor).toBeCloseTo(1, 6);
  });

  it("settles both databases once before the first run", async () => {
    const events: string[] = [];
    const load = fakeLoad({ a: 1, b: 1 }, () => 1);
    const [a, b] = sides(["floor"]);
    await compare(a, b, { ...opts, rounds: 1, settle: async () => void events.push("settle"), load: async (...args) => (events.push("run"), load(...args)) });
    expect(events).toEqual(["settle", "run", "run", "run", "run"]);
  });
});
