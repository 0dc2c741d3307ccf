import { describe, expect, it } from "vitest";
import fc from "fast-check";
import turfDistance from "@turf/distance";
import { EARTH_RADIUS_KM, distanceMatrix, haversineKm, type LatLng } from "@/lib/runs/great-circle";

const turfKm = (a: LatLng, b: LatLng) => turfDistance([a.lng, a.lat], [b.lng, b.lat], { units: "kilometers" });
const dms = (d: number, m: number, s: number) => d + m / 60 + s / 3600;

describe("haversineKm", () => {
  it("uses the IUGG mean radius", () => {
    expect(EARTH_RADIUS_KM).toBe(6371.0088);
  });

  it("Land's End to John o' Groats is 968.9 km", () => {
    // Source: Movable Type Scripts, "Calculate distance, bearing and more between
    // Latitude/Longitude points" — its worked example gives 968.9 km for
    // Land's End 50°03′59″N 005°42′53″W to John o' Groats 58°38′38″N 003°04′12″W.
    // (The decimal rendering 50.0657 N 5.7132 W → 58.6373 N 3.0700 W is not the
    // same pair of points: John o' Groats sits 0.0066° further south there, and
    // the distance comes out 968.2 km — checked against turf below.)
    const landsEnd = { lat: dms(50, 3, 59), lng: -dms(5, 42, 53) };
    const johnOGroats = { lat: dms(58, 38, 38), lng: -dms(3, 4, 12) };
    const km = haversineKm(landsEnd, johnOGroats);
    expect(Math.abs(km - 968.9)).toBeLessThan(0.05);
    expect(km).toBeCloseTo(turfKm(landsEnd, johnOGroats), 9); // source: @turf/distance
  });

  it("the decimal-degree Land's End / John o' Groats pair agrees with turf", () => {
    // Source: @turf/distance 7.4 on the same inputs (968.19 km).
    const a = { lat: 50.0657, lng: -5.7132 };
    const b = { lat: 58.6373, lng: -3.07 };
    expect(haversineKm(a, b)).toBeCloseTo(turfKm(a, b), 9);
    expect(Math.abs(haversineKm(a, b) - 968.19)).toBeLessThan(0.01);
  });

  it("turf's documented example is 97.13 km", () => {
    // Source: turf docs for `distance`: point([-75.343, 39.984]) to point([-75.534, 39.123]).
    const from = { lng: -75.343, lat: 39.984 };
    const to = { lng: -75.534, lat: 39.123 };
    expect(Math.abs(haversineKm(from, to) - 97.13)).toBeLessThan(0.005);
    expect(haversineKm(from, to)).toBeCloseTo(turfKm(from, to), 9);
  });

  it("one degree of latitude is 111.195 km", () => {
    // Source: 2π · 6371.0088 / 360 = 111.19508 km (arc length of 1° on the sphere).
    const expected = (2 * Math.PI * 6371.0088) / 360;
    expect(haversineKm({ lat: 0, lng: 0 }, { lat: 1, lng: 0 })).toBeCloseTo(expected, 9);
    expect(haversineKm({ lat: 45, lng: 12 }, { lat: 46, lng: 12 })).toBeCloseTo(expected, 9);
    expect(Math.abs(expected - 111.195)).toBeLessThan(0.0005);
  });

  it("agrees with @turf/distance to 1e-9 relative on random pairs", () => {
    // Source: @turf/distance (same haversine, same 6371.0088 km radius).
    const point = fc.record({
      lat: fc.double({ min: -90, max: 90, noNaN: true }),
      lng: fc.double({ min: -180, max: 180, noNaN: true }),
    });
    fc.assert(
      fc.property(point, point, (a, b) => {
        const ours = haversineKm(a, b);
        const theirs = turfKm(a, b);
        // Relative for anything over 1 km; below that, 1e-9 km (1 µm) absolute,
        // because two points a few metres apart across ±180° make sin(Δλ/2)
        // cancel in both formulas and the last few nanometres are rounding.
        expect(Math.abs(ours - theirs)).toBeLessThanOrEqual(1e-9 * Math.max(theirs, 1));
      }),
      { seed: 20250301, numRuns: 2000 },
    );
  });

  it("is zero for the same point, symmetric, and at most half the circumference", () => {
    const a = { lat: 51.5, lng: -0.12 };
    expect(haversineKm(a, a)).toBe(0);
    const b = { lat: -33.9, lng: 151.2 };
    expect(haversineKm(a, b)).toBe(haversineKm(b, a));
    const antipode = { lat: -51.5, lng: 179.88 };
    expect(haversineKm(a, antipode)).toBeCloseTo(Math.PI * EARTH_RADIUS_KM, 6);
  });
});

describe("distanceMatrix", () => {
  it("is symmetric with a zero diagonal and matches pairwise distances", () => {
    const pts = [
      { lat: 0, lng: 0 },
      { lat: 1, lng: 1 },
      { lat: -2, lng: 3 },
    ];
    const m = distanceMatrix(pts);
    for (let i = 0; i < 3; i++) {
      expect(m[i * 3 + i]).toBe(0);
      for (let j = 0; j < 3; j++) {
        expect(m[i * 3 + j]).toBe(m[j * 3 + i]);
        if (i !== j) expect(m[i * 3 + j]).toBe(haversineKm(pts[i]!, pts[j]!));
      }
    }
  });
});
