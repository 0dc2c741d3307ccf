import { describe, expect, it } from "vitest";
import turfDistance from "@turf/distance";
import { legsInOrder, reoptimisedOrder } from "@/lib/runs/run-edit-plan";
import { closedStopWarnings, haulDayWarning } from "@/lib/runs/warnings";
import type { RunDetail, RunStop } from "@/lib/runs/types";

// References: @turf/distance (haversine on the mean Earth radius) for lengths; every
// order tried by brute force for "shortest".
const start = { lat: 47.19, lng: -8.0 };
const pts = [
  { dropPointId: "a", lat: 47.205, lng: -7.97 },
  { dropPointId: "b", lat: 47.2, lng: -8.04 },
  { dropPointId: "c", lat: 47.23, lng: -8.01 },
  { dropPointId: "d", lat: 47.18, lng: -7.99 },
  { dropPointId: "e", lat: 47.21, lng: -8.02 },
];
const turf = (a: { lat: number; lng: number }, b: { lat: number; lng: number }) => turfDistance([a.lng, a.lat], [b.lng, b.lat]);
function length(order: string[], back: boolean) {
  const byId = new Map(pts.map((p) => [p.dropPointId, p]));
  let km = 0;
  let prev = start;
  for (const id of order) {
    km += turf(prev, byId.get(id)!);
    prev = byId.get(id)!;
  }
  return km + (back ? turf(prev, start) : 0);
}
function permutations(ids: string[]): string[][] {
  if (ids.length <= 1) return [ids];
  return ids.flatMap((id, i) => permutations([...ids.slice(0, i), ...ids.slice(i + 1)]).map((rest) => [id, ...rest]));
}

describe("legsInOrder", () => {
  it("measures each leg and the total as @turf/distance does, with the way back on a closed run", () => {
    const open = legsInOrder(start, pts, false);
    expect(open.legs[0]).toBeCloseTo(turf(start, pts[0]!), 9);
    expect(open.distanceKm).toBeCloseTo(length(pts.map((p) => p.dropPointId), false), 9);
    expect(legsInOrder(start, pts, true).distanceKm).toBeCloseTo(length(pts.map((p) => p.dropPointId), true), 9);
  });
});

describe("reoptimisedOrder", () => {
  it("gives the shortest order of all when nothing is settled (open and closed runs)", () => {
    const stops = pts.map((p) => ({ ...p, status: "pending" as const }));
    for (const back of [false, true]) {
      const best = Math.min(...permutations(pts.map((p) => p.dropPointId)).map((o) => length(o, back)));
      expect(length(reoptimisedOrder(start, stops, back), back)).toBeCloseTo(best, 9);
    }
  });
  it("keeps settled stops first in their order and orders the rest shortest from the last of them", () => {
    const stops = [
      { ...pts[2]!, status: "logged" as const },
      { ...pts[0]!, status: "pending" as const },
      { ...pts[4]!, status: "skipped" as const },
      { ...pts[1]!, status: "pending" as const },
      { ...pts[3]!, status: "pending" as const },
    ];
    const order = reoptimisedOrder(start, stops, false);
    expect(order.slice(0, 2)).toEqual(["c", "e"]);
    const best = Math.min(...permutations(["a", "b", "d"]).map((o) => length(["c", "e", ...o], false)));
    expect(length(order, false)).toBeCloseTo(best, 9);
  });
});

function stop(id: string, name: string, openOnRunDay: boolean | null, status: RunStop["status"] = "pending"): RunStop {
  return { id, position: 1, legKm: 0, status, skipReason: null, haulId: null, resolvedAt: null, haul: null, openOnRunDay, dropPoint: { id, name, address: "", lat: 0, lng: 0, hours: "", capacityBags: 6, accessNotes: "", hostName: null, hostPhone: null, hostEmail: null, openingHours: [] } };
}

describe("warnings", () => {
  it("warns of pending stops closed on the run's weekday only (2026-12-03 is a Thursday, ISO day 4)", () => {
    const run = { plannedOn: "2026-12-03", state: "planned", stopList: [stop("1", "Market hut", false), stop("2", "Library", null), stop("3", "Chapel", true), stop("4", "Old hut", false, "logged")] } as Pick<RunDetail, "plannedOn" | "state" | "stopList">;
    expect(closedStopWarnings(run)).toEqual([{ kind: "closedOnRunDay", stopId: "1", message: "Market hut is not open on Thursdays by its opening hours." }]);
    expect(closedStopWarnings({ ...run, state: "cancelled" })).toEqual([]);
  });
  it("warns of a haul on another day in the group's zone, not on the run's day", () => {
    const late = new Date("2026-12-03T23:30:00Z"); // 3 Dec in London, 4 Dec in Auckland
    expect(haulDayWarning("2026-12-04", late, "Europe/London").map((w) => w.kind)).toEqual(["haulOffRunDay"]);
    expect(haulDayWarning("2026-12-04", late, "Pacific/Auckland")).toEqual([]);
  });
});
