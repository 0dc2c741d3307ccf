/**
 * Pickup-run ordering (computation 6): visit every chosen drop point once,
 * starting from a fixed point, either ending at the last stop (open path) or
 * returning to the start (closed tour).
 *
 * Up to EXACT_STOP_LIMIT stops the order is provably shortest (Held–Karp);
 * above that, nearest neighbour followed by 2-opt, which only ever applies
 * strictly improving moves and so is never longer than nearest neighbour.
 */
import { distanceMatrix, type LatLng } from "./great-circle";

/** The contract promises the shortest order for this many stops or fewer. */
export const EXACT_STOP_LIMIT = 8;

/** Caps the improvement loop so a pathological input cannot stall a request. */
export const MAX_TWO_OPT_PASSES = 100;

/** Moves must gain more than this (km) so float noise cannot cycle 2-opt. */
const MIN_GAIN_KM = 1e-9;

export interface RouteStop extends LatLng {
  id: string;
}

export interface PlanRouteInput {
  start: LatLng;
  stops: readonly RouteStop[];
  returnToStart?: boolean;
}

export interface RouteLeg {
  /** Stop id, or null for the start point (a stop id can never be confused with it). */
  from: string | null;
  /** Stop id, or null for the way back to the start on a closed tour. */
  to: string | null;
  km: number;
}

export interface RoutePlan {
  /** Stop ids in visiting order; the start is implicit. */
  order: string[];
  /** Sum of the legs, in km, unrounded (round for display only). */
  distanceKm: number;
  legs: RouteLeg[];
}

export function planRoute(input: PlanRouteInput): RoutePlan {
  const closed = input.returnToStart === true;
  const points: LatLng[] = [input.start, ...input.stops];
  for (const p of points) {
    if (!Number.isFinite(p.lat) || !Number.isFinite(p.lng)) {
      throw new RangeError("planRoute needs finite coordinates; validate with routeInputSchema first");
    }
  }
  const n = input.stops.length;
  const size = n + 1; // node 0 is the start, node k is stops[k − 1]
  const dist = distanceMatrix(points);

  const nodes =
    n <= EXACT_STOP_LIMIT
      ? exactOrder(n, dist, size, closed)
      : twoOpt(nearestNeighbour(n, dist, size), dist, size, closed);

  const legs: RouteLeg[] = [];
  let prev = 0;
  for (const node of nodes) {
    legs.push({ from: idOf(input.stops, prev), to: idOf(input.stops, node), km: dist[prev * size + node]! });
    prev = node;
  }
  if (closed && n > 0) legs.push({ from: idOf(input.stops, prev), to: null, km: dist[prev * size]! });

  return {
    order: nodes.map((node) => input.stops[node - 1]!.id),
    distanceKm: legs.reduce((sum, leg) => sum + leg.km, 0),
    legs,
  };
}

function idOf(stops: readonly RouteStop[], node: number): string | null {
  return node === 0 ? null : stops[node - 1]!.id;
}

/**
 * Held–Karp dynamic programme over subsets: best[mask][j] is the shortest
 * path from the start through exactly the stops in `mask`, ending at j.
 * 2^8 · 8 states is tiny, and unlike enumerating 8! orders it stays cheap if
 * the limit is ever raised a little.
 */
function exactOrder(n: number, dist: Float64Array, size: number, closed: boolean): number[] {
  if (n === 0) return [];
  const states = 1 << n;
  const best = new Float64Array(states * n).fill(Infinity);
  const parent = new Int16Array(states * n).fill(-1);
  for (let j = 0; j < n; j++) best[(1 << j) * n + j] = dist[j + 1]!;

  for (let mask = 1; mask < states; mask++) {
    for (let j = 0; j < n; j++) {
      if (!(mask & (1 << j))) continue;
      const here = best[mask * n + j]!;
      if (here === Infinity) continue;
      for (let k = 0; k < n; k++) {
        if (mask & (1 << k)) continue;
        const next = mask | (1 << k);
        const cost = here + dist[(j + 1) * size + (k + 1)]!;
        if (cost < best[next * n + k]!) {
          best[next * n + k] = cost;
          parent[next * n + k] = j;
        }
      }
    }
  }

  const full = states - 1;
  let last = 0;
  let bestTotal = Infinity;
  for (let j = 0; j < n; j++) {
    const total = best[full * n + j]! + (closed ? dist[(j + 1) * size]! : 0);
    if (total < bestTotal) {
      bestTotal = total;
      last = j;
    }
  }

  const reversed: number[] = [];
  let mask = full;
  let j = last;
  while (j >= 0) {
    reversed.push(j + 1);
    const p = parent[mask * n + j]!;
    mask &= ~(1 << j);
    j = p;
  }
  return reversed.reverse();
}

/** Greedy walk from the start; ties go to the earlier stop so runs are reproducible. */
function nearestNeighbour(n: number, dist: Float64Array, size: number): number[] {
  const visited = new Uint8Array(size);
  const order: number[] = [];
  let here = 0;
  for (let step = 0; step < n; step++) {
    let next = -1;
    let nearest = Infinity;
    for (let k = 1; k < size; k++) {
      if (visited[k]) continue;
      const d = dist[here * size + k]!;
      if (d < nearest) {
        nearest = d;
        next = k;
      }
    }
    visited[next] = 1;
    order.push(next);
    here = next;
  }
  return order;
}

/**
 * First-improvement 2-opt on the stop sequence with the start pinned in
 * front. Reversing stops i..j replaces edges (t[i−1], t[i]) and (t[j], t[j+1]);
 * on an open path, when j is the last stop there is no edge after it, so only
 * the first edge changes — this is what lets the free end move.
 */
function twoOpt(stops: number[], dist: Float64Array, size: number, closed: boolean): number[] {
  const tour = [0, ...stops];
  const last = tour.length - 1;
  for (let pass = 0; pass < MAX_TWO_OPT_PASSES; pass++) {
    let improved = false;
    for (let i = 1; i < last; i++) {
      for (let j = i + 1; j <= last; j++) {
        const a = tour[i - 1]!;
        const b = tour[i]!;
        const c = tour[j]!;
        let delta = dist[a * size + c]! - dist[a * size + b]!;
        const after = j < last ? tour[j + 1]! : closed ? 0 : -1;
        if (after >= 0) delta += dist[b * size + after]! - dist[c * size + after]!;
        if (delta < -MIN_GAIN_KM) {
          reverse(tour, i, j);
          improved = true;
        }
      }
    }
    if (!improved) break;
  }
  return tour.slice(1);
}

function reverse(a: number[], i: number, j: number): void {
  for (; i < j; i++, j--) {
    const t = a[i]!;
    a[i] = a[j]!;
    a[j] = t;
  }
}
