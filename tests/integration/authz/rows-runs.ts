import { testDb } from "@/tests/support/db";
import { everyone, expects, row } from "./row";
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
  row("POST", "plan/route", "/api/plan/route", everyone(422), {
    body: () => ({ start: { lat: 0, lng: 0 }, stops: [] }),
    note: "a pure computation open to anyone; the empty stop list is refused for every caller",
  }),
  row("GET", "runs", "/api/runs", expects(401, 200, 403, 200, 200), { note: "volunteers see only their own runs; other groups see their own (none of ours)" }),
  row("POST", "runs", "/api/runs", expects(401, 403, 403, 422, 422), { body: () => ({ dropPointIds: [] }) }),
  row("GET", "runs/suggestions", (f) => `/api/runs/suggestions?driveId=${f.demoDriveId}`, expects(401, 403, 403, 200, 404)),
  row("GET", "runs/[id]", runPath, expects(401, 200, 403, 200, 404)),
  // Editing and cancelling are the organisers' (issue 16); the run's volunteer may settle stops only.
  // Each body is refused on purpose, so those let in get 422 and nothing changes.
  row("PATCH", "runs/[id]", runPath, expects(401, 403, 403, 422, 404), { body: () => ({ plannedOn: "not-a-day" }) }),
  row("PUT", "runs/[id]/stops", `${runPath}/stops`, expects(401, 403, 403, 422, 404), { body: () => ({ dropPointIds: [] }) }),
  row("POST", "runs/[id]/optimise", `${runPath}/optimise`, expects(401, 403, 403, 422, 404), { body: () => ({ unexpected: true }) }),
  row("POST", "runs/[id]/cancel", `${runPath}/cancel`, expects(401, 403, 403, 422, 404), { body: () => ({ reason: "" }) }),
  row("POST", "runs/[id]/stops/[stopId]/skip", `${stopPath}/skip`, expects(401, 422, 403, 422, 404), { body: () => ({ reason: "" }) }),
  row("POST", "runs/[id]/stops/[stopId]/unskip", `${stopPath}/unskip`, expects(401, 409, 403, 409, 404), {
    note: "the demo stop is pending, so those who may touch it get 409 (not skipped)",
  }),
  row("POST", "runs/[id]/stops/[stopId]/log", `${stopPath}/log`, expects(401, 422, 403, 422, 404), { body: () => ({ haulId: "not-a-haul" }) }),
  row("POST", "runs/[id]/stops/[stopId]/haul", `${stopPath}/haul`, expects(401, 422, 403, 422, 404), { body: () => ({ bags: -1 }) }),
];
