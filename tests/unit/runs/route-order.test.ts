import { describe, expect, it } from "vitest";
import turfDistance from "@turf/distance";
import { EXACT_STOP_LIMIT, planRoute, type RouteStop } from "@/lib/runs/route-order";
import type { LatLng } from "@/lib/runs/great-circle";

// mulberry32: a tiny seeded generator so every random case reproduces.
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

// Stops scattered over roughly a county (±0.4°) around a random centre.
function randomProblem(rand: () => number, n: number): { start: LatLng; stops: RouteStop[] } {
  const lat0 = -60 + rand() * 120;
  const lng0 = -180 + rand() * 360;
  const at = (): LatLng => ({ lat: lat0 + (rand() - 0.5) * 0.8, lng: lng0 + (rand() - 0.5) * 0.8 });
  return { start: at(), stops: Array.from({ length: n }, (_, i) => ({ id: `s${i}`, ...at() })) };
}

// Independent metric: turf, not the module under test.
function turfMatrix(points: LatLng[]): number[][] {
  return points.map((a) => points.map((b) => turfDistance([a.lng, a.lat], [b.lng, b.lat])));
}

function pathLength(d: number[][], nodes: number[], closed: boolean): number {
  let sum = 0;
  let prev = 0;
  for (const k of nodes) {
    sum += d[prev]![k]!;
    prev = k;
  }
  return closed && nodes.length > 0 ? sum + d[prev]![0]! : sum;
}

// Brute force over every order, by plain recursive enumeration.
function bruteForceBest(d: number[][], n: number, closed: boolean): number {
  let best = Infinity;
  const used = new Array<boolean>(n + 1).fill(false);
  const order: number[] = [];
  const walk = () => {
    if (order.length === n) {
      best = Math.min(best, pathLength(d, order, closed));
      return;
    }
    for (let k = 1; k <= n; k++) {
      if (used[k]) continue;
      used[k] = true;
      order.push(k);
      walk();
      order.pop();
      used[k] = false;
    }
  };
  walk();
  return best;
}

function nearestNeighbourLength(d: number[][], n: number, closed: boolean): number {
  const seen = new Set<number>();
  const order: number[] = [];
  let here = 0;
  while (order.length < n) {
    let next = -1;
    for (let k = 1; k <= n; k++) if (!seen.has(k) && (next < 0 || d[here]![k]! < d[here]![next]!)) next = k;
    seen.add(next);
    order.push(next);
    here = next;
  }
  return pathLength(d, order, closed);
}

function nodesOf(order: string[]): number[] {
  return order.map((id) => Number(id.slice(1)) + 1);
}

describe("planRoute", () => {
  it("is provably shortest for 1..8 stops, open and closed (brute force)", () => {
    // Source of truth: exhaustive enumeration of all n! orders in this test, with turf distances.
    const rand = mulberry32(8);
    for (let n = 1; n <= EXACT_STOP_LIMIT; n++) {
      for (let trial = 0; trial < 6; trial++) {
        const { start, stops } = randomProblem(rand, n);
        const d = turfMatrix([start, ...stops]);
        for (const closed of [false, true]) {
          const plan = planRoute({ start, stops, returnToStart: closed });
          expect([...plan.order].sort()).toEqual(stops.map((s) => s.id).sort());
          const best = bruteForceBest(d, n, closed);
          expect(pathLength(d, nodesOf(plan.order), closed)).toBeCloseTo(best, 9);
          expect(plan.distanceKm).toBeCloseTo(best, 9);
        }
      }
    }
  });

  it("above 8 stops is never longer than nearest neighbour alone (50 sets)", () => {
    // Reference: nearest neighbour implemented independently above, with turf distances.
    const rand = mulberry32(50);
    let strictlyBetter = 0;
    for (let trial = 0; trial < 50; trial++) {
      const n = 9 + Math.floor(rand() * 72);
      const closed = trial % 2 === 1;
      const { start, stops } = randomProblem(rand, n);
      const d = turfMatrix([start, ...stops]);
      const plan = planRoute({ start, stops, returnToStart: closed });
      expect(new Set(plan.order).size).toBe(n);
      const ours = pathLength(d, nodesOf(plan.order), closed);
      const nn = nearestNeighbourLength(d, n, closed);
      expect(ours).toBeLessThanOrEqual(nn * (1 + 1e-9));
      expect(plan.distanceKm).toBeCloseTo(ours, 9);
      if (ours < nn * (1 - 1e-9)) strictlyBetter++;
    }
    // 2-opt must actually do work, not just return the greedy order.
    expect(strictlyBetter).toBeGreaterThan(35);
  });

  it("orders 200 random stops in well under a second", () => {
    const rand = mulberry32(200);
    for (const closed of [false, true]) {
      const problem = randomProblem(rand, 200);
      const t0 = performance.now();
      const plan = planRoute({ ...problem, returnToStart: closed });
      const ms = performance.now() - t0;
      expect(plan.order).toHaveLength(200);
      expect(ms).toBeLessThan(1000);
    }
  });

  it("handles the 500-stop maximum", () => {
    const plan = planRoute({ ...randomProblem(mulberry32(500), 500), returnToStart: true });
    expect(new Set(plan.order).size).toBe(500);
  });

  it("lets the open path's free end move (the far stop goes last)", () => {
    // Start at 0°, stops at 1°, 2°, 3° east along the equator: the only shortest
    // open path runs out in order; a closed tour is the same length either way round.
    const stops = [3, 1, 2].map((lng) => ({ id: `e${lng}`, lat: 0, lng }));
    const open = planRoute({ start: { lat: 0, lng: 0 }, stops });
    expect(open.order).toEqual(["e1", "e2", "e3"]);
    const oneDegree = (2 * Math.PI * 6371.0088) / 360; // arc length of 1° of the equator
    expect(open.distanceKm).toBeCloseTo(3 * oneDegree, 6);
    const closed = planRoute({ start: { lat: 0, lng: 0 }, stops, returnToStart: true });
    expect(closed.distanceKm).toBeCloseTo(6 * oneDegree, 6);
  });

  it("reports legs from the start (null) and back to it on a closed tour", () => {
    const start = { lat: 0, lng: 0 };
    const stops = [
      { id: "a", lat: 0, lng: 1 },
      { id: "b", lat: 0, lng: 2 },
    ];
    const open = planRoute({ start, stops });
    expect(open.legs.map((l) => [l.from, l.to])).toEqual([
      [null, "a"],
      ["a", "b"],
    ]);
    const closed = planRoute({ start, stops, returnToStart: true });
    expect(closed.legs).toHaveLength(3);
    expect(closed.legs.at(-1)?.to).toBeNull();
    expect(closed.distanceKm).toBeCloseTo(closed.legs.reduce((s, l) => s + l.km, 0), 12);
  });

  it("returns an empty route for no stops and rejects non-finite coordinates", () => {
    expect(planRoute({ start: { lat: 1, lng: 1 }, stops: [], returnToStart: true })).toEqual({
      order: [],
      distanceKm: 0,
      legs: [],
    });
    expect(() => planRoute({ start: { lat: NaN, lng: 0 }, stops: [{ id: "x", lat: 0, lng: 0 }] })).toThrow(RangeError);
  });

  it("is deterministic for the same input", () => {
    const problem = randomProblem(mulberry32(7), 40);
    expect(planRoute(problem)).toEqual(planRoute(problem));
  });
});
