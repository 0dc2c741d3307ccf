import { describe, expect, it } from "vitest";
import { MAX_ROUTE_STOPS, routeInputSchema } from "@/lib/runs/route-schemas";

function issues(input: unknown): Record<string, string> {
  const result = routeInputSchema.safeParse(input);
  expect(result.success).toBe(false);
  const out: Record<string, string> = {};
  for (const issue of result.error?.issues ?? []) out[issue.path.join(".")] ??= issue.message;
  return out;
}

const start = { lat: 51.5, lng: -0.12 };

describe("routeInputSchema", () => {
  it("accepts a valid route, normalises ids to strings and defaults returnToStart", () => {
    const parsed = routeInputSchema.parse({
      start,
      stops: [
        { id: 7, lat: 51.6, lng: -0.1 },
        { id: "dp-2", lat: -90, lng: 180 },
      ],
    });
    expect(parsed.stops.map((s) => s.id)).toEqual(["7", "dp-2"]);
    expect(parsed.returnToStart).toBe(false);
  });

  it("rejects no stops", () => {
    expect(issues({ start, stops: [] })).toEqual({ stops: "Choose at least one stop" });
  });

  it("rejects a stop without coordinates, naming both fields", () => {
    expect(issues({ start, stops: [{ id: "a" }] })).toEqual({
      "stops.0.lat": "Latitude is required",
      "stops.0.lng": "Longitude is required",
    });
  });

  it("rejects latitude 91 and longitude −181", () => {
    const out = issues({ start: { lat: 91, lng: 0 }, stops: [{ id: 1, lat: 0, lng: -181 }] });
    expect(out["start.lat"]).toMatch(/between −90 and 90/);
    expect(out["stops.0.lng"]).toMatch(/between −180 and 180/);
  });

  it("rejects more than 500 stops", () => {
    const stops = Array.from({ length: MAX_ROUTE_STOPS + 1 }, (_, i) => ({ id: i, lat: 0, lng: 0 }));
    expect(issues({ start, stops })).toEqual({ stops: "A route can have at most 500 stops" });
    expect(routeInputSchema.safeParse({ start, stops: stops.slice(1) }).success).toBe(true);
  });

  it("rejects duplicate ids, including 7 and \"7\"", () => {
    const out = issues({
      start,
      stops: [
        { id: 7, lat: 0, lng: 0 },
        { id: "7", lat: 1, lng: 1 },
      ],
    });
    expect(out).toEqual({ "stops.1.id": 'Stop id "7" appears more than once' });
  });

  it("rejects missing or empty ids, non-numeric coordinates and a missing start", () => {
    expect(issues({ start, stops: [{ lat: 0, lng: 0 }] })["stops.0.id"]).toMatch(/needs an id/);
    expect(issues({ start, stops: [{ id: " ", lat: 0, lng: 0 }] })["stops.0.id"]).toBe("A stop id cannot be empty");
    expect(issues({ start, stops: [{ id: 1, lat: "51", lng: NaN }] })).toEqual({
      "stops.0.lat": "Latitude must be a number in degrees",
      "stops.0.lng": "Longitude must be a number in degrees",
    });
    expect(Object.keys(issues({ stops: [{ id: 1, lat: 0, lng: 0 }] }))).toEqual(["start"]);
    expect(issues({ start, stops: [{ id: 1, lat: 0, lng: 0 }], returnToStart: "yes" })).toEqual({
      returnToStart: "Return to start must be true or false",
    });
  });

  it("rejects a body that is not an object", () => {
    expect(issues(null)).toEqual({ "": "Send a start point and a list of stops" });
  });
});
