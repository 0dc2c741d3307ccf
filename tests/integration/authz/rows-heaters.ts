import type { AuthzRow } from "./types";

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
