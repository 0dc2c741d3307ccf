import { testDb } from "@/tests/support/db";
import type { AuthzRow } from "./types";

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
    .insert({ group_id: group.id, drive_id: null, builder_id: organiser.id, name, glazing_width: 30, glazing_height: 60, unit: "in", columns: 11, rows: 12, cans: 132 })
    .returning("id");
  return row.id;
}
const organisersUnit = await organisersUnitId();

// Heater planning and units. Mutations send invalid bodies on purpose: allowed
// callers get 422 and nothing is written.
const allAnswer = (status: number) => ({ anonymous: status, volunteer: status, builder: status, organiser: status, otherOrganiser: status });

export const rows: AuthzRow[] = [
  {
    route: "app/api/plan/can-grid/route.ts",
    method: "POST",
    path: () => "/api/plan/can-grid",
    body: () => ({ glazingWidth: -1 }),
    expect: allAnswer(422),
    note: "the planner works without an account",
  },
  {
    route: "app/api/plan/heat-output/route.ts",
    method: "POST",
    path: () => "/api/plan/heat-output",
    body: () => ({ apertureAreaM2: 0 }),
    expect: allAnswer(422),
    note: "the planner works without an account",
  },
  {
    route: "app/api/heaters/route.ts",
    method: "POST",
    path: () => "/api/heaters",
    body: () => ({ name: "" }),
    expect: { anonymous: 401, volunteer: 403, builder: 422, organiser: 422, otherOrganiser: 422 },
    note: "the other group's organiser may save to their own drives; the body is invalid for everyone",
  },
  {
    route: "app/api/heaters/[id]/state/route.ts",
    method: "POST",
    path: (f) => `/api/heaters/${f.demoHeaterId}/state`,
    body: () => ({ state: "scrapped" }),
    expect: { anonymous: 401, volunteer: 403, builder: 422, organiser: 422, otherOrganiser: 404 },
  },
];

rows.push({
  route: "app/api/heaters/[id]/claim-moves/route.ts",
  method: "POST",
  path: (f) => `/api/heaters/${f.demoHeaterId}/claim-moves`,
  body: () => ({ quantity: -1 }),
  expect: { anonymous: 401, volunteer: 403, builder: 403, organiser: 422, otherOrganiser: 404 },
  note: "only organisers move claims between units",
});

// Builders act only on the units they build (issue 12, finding 7).
const othersUnit = { anonymous: 401, volunteer: 403, builder: 403, organiser: 422, otherOrganiser: 404 };
rows.push(
  ...(["claims", "releases", "built-in"] as const).map(
    (what): AuthzRow => ({
      route: `app/api/heaters/[id]/${what}/route.ts`,
      method: "POST",
      path: () => `/api/heaters/${organisersUnit}/${what}`,
      body: () => ({ quantity: 0 }),
      expect: othersUnit,
      note: "a unit the organiser builds: the builder is refused before the body is read",
    }),
  ),
  {
    route: "app/api/heaters/[id]/state/route.ts",
    method: "POST",
    path: () => `/api/heaters/${organisersUnit}/state`,
    body: () => ({ state: "scrapped" }),
    expect: othersUnit,
    note: "a unit the organiser builds: the builder is refused before the body is read",
  },
);
