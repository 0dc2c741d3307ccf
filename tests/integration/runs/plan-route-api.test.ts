import { describe, expect, it } from "vitest";
import turfDistance from "@turf/distance";
import { ApiClient } from "@/tests/support/http";

// POST /api/plan/route through HTTP, as an outside caller sees it.
interface Answer {
  order: (string | number)[];
  distanceKm: number;
  legs: { from: string | number | null; to: string | number | null; distanceKm: number }[];
}
interface ErrorAnswer {
  error: { code: string; message: string; fields: Record<string, string> };
}

const api = new ApiClient();
const post = <T>(body: unknown) => api.json<T>("POST", "/api/plan/route", body);

// Reference metric: @turf/distance (haversine on a sphere of 6371.0088 km, turf's earthRadius).
const turfKm = (a: { lat: number; lng: number }, b: { lat: number; lng: number }) =>
  turfDistance([a.lng, a.lat], [b.lng, b.lat], { units: "kilometers" });

function permutations<T>(items: T[]): T[][] {
  if (items.length <= 1) return [items];
  return items.flatMap((item, i) => permutations([...items.slice(0, i), ...items.slice(i + 1)]).map((rest) => [item, ...rest]));
}

describe("POST /api/plan/route", () => {
  it("orders a small case as brute force over @turf/distance says, with the same total", async () => {
    const start = { lat: 47.1978, lng: -8.0061 };
    const stops = [
      { id: "a", lat: 47.2049, lng: -7.9921 },
      { id: "b", lat: 47.1951, lng: -8.0104 },
      { id: "c", lat: 47.2071, lng: -8.0089 },
      { id: "d", lat: 47.1932, lng: -7.9968 },
    ];
    for (const returnToStart of [false, true]) {
      // Every order's length by @turf/distance; the contract promises the shortest for ≤ 8 stops.
      const lengths = permutations(stops).map((order) => {
        const path = [start, ...order, ...(returnToStart ? [start] : [])];
        let km = 0;
        for (let i = 1; i < path.length; i++) km += turfKm(path[i - 1]!, path[i]!);
        return { ids: order.map((s) => s.id), km };
      });
      const best = lengths.reduce((a, b) => (b.km < a.km ? b : a));
      const res = await post<Answer>({ start, stops, returnToStart });
      expect(res.status).toBe(200);
      expect(res.body.distanceKm).toBeCloseTo(best.km, 6);
      const mine = lengths.find((l) => l.ids.join() === res.body.order.join())!;
      expect(mine.km).toBeCloseTo(best.km, 9);
      expect(res.body.legs).toHaveLength(returnToStart ? 5 : 4);
      expect(res.body.legs.reduce((s, l) => s + l.distanceKm, 0)).toBeCloseTo(res.body.distanceKm, 9);
    }
  });

  it("gives Land's End to John o' Groats as about 968.9 km", async () => {
    // 968.9 km: the worked example of the Movable Type Scripts haversine page
    // (50°03′59″N 005°42′53″W to 58°38′38″N 003°04′12″W).
    const start = { lat: 50 + 3 / 60 + 59 / 3600, lng: -(5 + 42 / 60 + 53 / 3600) };
    const jog = { id: "jog", lat: 58 + 38 / 60 + 38 / 3600, lng: -(3 + 4 / 60 + 12 / 3600) };
    const res = await post<Answer>({ start, stops: [jog] });
    expect(res.status).toBe(200);
    expect(res.body.order).toEqual(["jog"]);
    expect(res.body.distanceKm).toBeCloseTo(968.9, 1);
    expect(res.body.distanceKm).toBeCloseTo(turfKm(start, jog), 6);
  });

  it("hands ids back exactly as sent (numbers stay numbers)", async () => {
    const res = await post<Answer>({ start: { lat: 0, lng: 0 }, stops: [{ id: 2, lat: 0, lng: 2 }, { id: 1, lat: 0, lng: 1 }] });
    expect(res.status).toBe(200);
    expect(res.body.order).toEqual([1, 2]);
    // One degree of longitude on the equator = one degree of arc: 2π·6371.0088/360 ≈ 111.195 km (IUGG mean radius).
    expect(res.body.distanceKm).toBeCloseTo((2 * Math.PI * 6371.0088 * 2) / 360, 6);
  });

  it("answers 200 random stops well under a second, measured through HTTP", async () => {
    await post<Answer>({ start: { lat: 47, lng: -8 }, stops: [{ id: "warm", lat: 47.1, lng: -8 }] });
    let seed = 7;
    const rand = () => ((seed = (seed * 16807) % 2147483647) / 2147483647);
    const stops = Array.from({ length: 200 }, (_, i) => ({ id: `s${i}`, lat: 47 + rand() * 0.3, lng: -8.2 + rand() * 0.4 }));
    const started = performance.now();
    const res = await post<Answer>({ start: { lat: 47.15, lng: -8 }, stops });
    const ms = performance.now() - started;
    console.log(`200 stops ordered through HTTP in ${ms.toFixed(0)} ms`);
    expect(res.status).toBe(200);
    expect(ms).toBeLessThan(1000);
    expect([...res.body.order].sort()).toEqual(stops.map((s) => s.id).sort());
    // Total agrees with @turf/distance over the returned order.
    const byId = new Map(stops.map((s) => [s.id, s]));
    let km = 0;
    let prev: { lat: number; lng: number } = { lat: 47.15, lng: -8 };
    for (const id of res.body.order) {
      km += turfKm(prev, byId.get(id as string)!);
      prev = byId.get(id as string)!;
    }
    expect(res.body.distanceKm).toBeCloseTo(km, 6);
  });

  it.each([
    ["no stops", { start: { lat: 1, lng: 1 }, stops: [] }, { stops: "Choose at least one stop" }],
    ["a stop without coordinates", { start: { lat: 1, lng: 1 }, stops: [{ id: "x" }] }, { "stops.0.lat": "Latitude is required", "stops.0.lng": "Longitude is required" }],
    ["more than 500 stops", { start: { lat: 1, lng: 1 }, stops: Array.from({ length: 501 }, (_, i) => ({ id: i, lat: 1, lng: 1 })) }, { stops: "A route can have at most 500 stops" }],
    ["no start", { stops: [{ id: 1, lat: 1, lng: 1 }] }, { start: "A point needs a latitude and a longitude" }],
  ])("refuses %s with 422 and field errors", async (_name, body, fields) => {
    const res = await post<ErrorAnswer>(body);
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_input");
    expect(res.body.error.fields).toEqual(fields);
  });

  it("refuses a body that is not JSON with 422", async () => {
    const res = await api.json<ErrorAnswer>("POST", "/api/plan/route", "not json", { "content-type": "application/json" });
    expect(res.status).toBe(422);
  });
});
