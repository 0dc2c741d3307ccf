import { testDb } from "@/tests/support/db";
import { everyone, expects, row } from "./row";
import type { AuthzRow } from "./types";
import { planColumns } from "@/lib/heaters/plan-columns";

// A unit the demo organiser builds, counted against no drive so no target or
// balance moves: the demo builder may not act on it (403 before the body is
// read), the organiser may (422 for the invalid body).
async function organisersUnitId(): Promise<string> {
  const db = testDb();
  const name = "Authz check: the organiser's own unit";
  const found = await db("heater_units").where({ name }).first("id");
  if (found) return found.id;
  const organiser = await db("users").where({ email: "organiser@cantrove.test" }).first("id");
  const group = await db("groups").where({ slug: "larkhollow-warm-rooms" }).first("id");
  const [row] = await db("heater_units")
    .insert({ group_id: group.id, drive_id: null, builder_id: organiser.id, name, ...planColumns({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" }), columns: 11, rows: 12, cans: 132 })
    .returning("id");
  return row.id;
}
const organisersUnit = await organisersUnitId();

// Heater planning and units. Mutations send invalid bodies on purpose: allowed
// callers get 422 and nothing is written.

export const rows: AuthzRow[] = [
  row("POST", "plan/can-grid", "/api/plan/can-grid", everyone(422), { body: () => ({ glazingWidth: -1 }), note: "the planner works without an account" }),
  row("POST", "plan/heat-output", "/api/plan/heat-output", everyone(422), {
    body: () => ({ apertureAreaM2: 0 }),
    note: "the planner works without an account",
  }),
  row("POST", "heaters", "/api/heaters", expects(401, 403, 422, 422, 422), {
    body: () => ({ name: "" }),
    note: "the other group's organiser may save to their own drives; the body is invalid for everyone",
  }),
  row("POST", "heaters/[id]/state", (f) => `/api/heaters/${f.demoHeaterId}/state`, expects(401, 403, 422, 422, 404), { body: () => ({ state: "scrapped" }) }),
];

rows.push(
  row("POST", "heaters/[id]/claim-moves", (f) => `/api/heaters/${f.demoHeaterId}/claim-moves`, expects(401, 403, 403, 422, 404), {
    body: () => ({ quantity: -1 }),
    note: "only organisers move claims between units",
  }),
);

// Builders act only on the units they build (issue 12, finding 7).
const othersUnit = expects(401, 403, 403, 422, 404);
const refusedBuilder = "a unit the organiser builds: the builder is refused before the body is read";
rows.push(
  ...(["claims", "releases", "built-in"] as const).map((what) =>
    row("POST", `heaters/[id]/${what}`, `/api/heaters/${organisersUnit}/${what}`, othersUnit, { body: () => ({ quantity: 0 }), note: refusedBuilder }),
  ),
  row("POST", "heaters/[id]/state", `/api/heaters/${organisersUnit}/state`, othersUnit, { body: () => ({ state: "scrapped" }), note: refusedBuilder }),
);

// Archiving and restoring a unit (issue 16): a stray field is 422 for those allowed, nothing changes.
rows.push(
  ...(["archive", "restore"] as const).flatMap((what) => [
    row("POST", `heaters/[id]/${what}`, (f) => `/api/heaters/${f.demoHeaterId}/${what}`, expects(401, 403, 422, 422, 404), { body: () => ({ sure: "yes" }) }),
    row("POST", `heaters/[id]/${what}`, `/api/heaters/${organisersUnit}/${what}`, othersUnit, { body: () => ({ sure: "yes" }), note: refusedBuilder }),
  ]),
);

// A unit's new glazing (issue 16): organisers only, even for a builder's own unit; the invalid plan changes nothing.
rows.push(
  row("POST", "heaters/[id]/glazing", (f) => `/api/heaters/${f.demoHeaterId}/glazing`, expects(401, 403, 403, 422, 404), {
    body: () => ({ plan: { glazingWidth: -1 } }),
    note: "only organisers change a unit's glazing; another group's unit is 404",
  }),
);
