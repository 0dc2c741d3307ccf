import { testDb } from "@/tests/support/db";
import type { AuthzRow } from "./types";

// The demo seed's planned run (given to the demo volunteer) and one of its stops.
const demoRun = await testDb()("pickup_runs as r")
  .join("groups as g", "g.id", "r.group_id")
  .where("g.slug", "larkhollow-warm-rooms")
  .orderBy("r.created_at")
  .first("r.id");
const demoStop = await testDb()("pickup_run_stops").where({ run_id: demoRun.id }).orderBy("position").first("id");
const runPath = `/api/runs/${demoRun.id}`;
const stopPath = `${runPath}/stops/${demoStop.id}`;

export const rows: AuthzRow[] = [
  {
    route: "app/api/plan/route/route.ts",
    method: "POST",
    path: () => "/api/plan/route",
    body: () => ({ start: { lat: 0, lng: 0 }, stops: [] }),
    expect: { anonymous: 422, volunteer: 422, builder: 422, organiser: 422, otherOrganiser: 422 },
    note: "a pure computation open to anyone; the empty stop list is refused for every caller",
  },
  {
    route: "app/api/runs/route.ts",
    method: "GET",
    path: () => "/api/runs",
    expect: { anonymous: 401, volunteer: 200, builder: 403, organiser: 200, otherOrganiser: 200 },
    note: "volunteers see only their own runs; other groups see their own (none of ours)",
  },
  {
    route: "app/api/runs/route.ts",
    method: "POST",
    path: () => "/api/runs",
    body: () => ({ dropPointIds: [] }),
    expect: { anonymous: 401, volunteer: 403, builder: 403, organiser: 422, otherOrganiser: 422 },
  },
  {
    route: "app/api/runs/suggestions/route.ts",
    method: "GET",
    path: (f) => `/api/runs/suggestions?driveId=${f.demoDriveId}`,
    expect: { anonymous: 401, volunteer: 403, builder: 403, organiser: 200, otherOrganiser: 404 },
  },
  {
    route: "app/api/runs/[id]/route.ts",
    method: "GET",
    path: () => runPath,
    expect: { anonymous: 401, volunteer: 200, builder: 403, organiser: 200, otherOrganiser: 404 },
  },
  {
    route: "app/api/runs/[id]/stops/[stopId]/skip/route.ts",
    method: "POST",
    path: () => `${stopPath}/skip`,
    body: () => ({ reason: "" }),
    expect: { anonymous: 401, volunteer: 422, builder: 403, organiser: 422, otherOrganiser: 404 },
  },
  {
    route: "app/api/runs/[id]/stops/[stopId]/unskip/route.ts",
    method: "POST",
    path: () => `${stopPath}/unskip`,
    note: "the demo stop is pending, so those who may touch it get 409 (not skipped)",
    expect: { anonymous: 401, volunteer: 409, builder: 403, organiser: 409, otherOrganiser: 404 },
  },
  {
    route: "app/api/runs/[id]/stops/[stopId]/log/route.ts",
    method: "POST",
    path: () => `${stopPath}/log`,
    body: () => ({ haulId: "not-a-haul" }),
    expect: { anonymous: 401, volunteer: 422, builder: 403, organiser: 422, otherOrganiser: 404 },
  },
  {
    route: "app/api/runs/[id]/stops/[stopId]/haul/route.ts",
    method: "POST",
    path: () => `${stopPath}/haul`,
    body: () => ({ bags: -1 }),
    expect: { anonymous: 401, volunteer: 422, builder: 403, organiser: 422, otherOrganiser: 404 },
  },
];
