import { testDb } from "@/tests/support/db";
import type { AuthzRow } from "./types";

// The ledger's routes. Mutations send an invalid body, so allowed callers get
// 422 and nothing is written; another group's records are 404 before parsing.
// The reversal row uses a sorted demo haul, which no one may undo before its
// sort: allowed callers get 409 and the demo keeps its history.
const sortedHaul = await testDb()("hauls as h")
  .join("drives as d", "d.id", "h.drive_id")
  .join("users as u", "u.id", "h.recorded_by")
  .where({ "d.slug": "larkhollow-winter-2026", "u.email": "volunteer@cantrove.test" })
  .whereNotNull("h.sort_id")
  .first("h.movement_id");
const movementId: string = sortedHaul?.movement_id ?? "00000000-0000-4000-8000-000000000000";

const signedIn = { anonymous: 401, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 };
const volunteerWrite = { anonymous: 401, volunteer: 422, builder: 403, organiser: 422, otherOrganiser: 404 };
const builderWrite = { anonymous: 401, volunteer: 403, builder: 422, organiser: 422, otherOrganiser: 404 };

export const rows: AuthzRow[] = [
  {
    route: "app/api/drives/[id]/stock/route.ts",
    method: "GET",
    path: (f) => `/api/drives/${f.demoDriveId}/stock`,
    expect: { ...signedIn, otherOrganiser: 404 },
  },
  {
    route: "app/api/drives/[id]/hauls/route.ts",
    method: "GET",
    path: (f) => `/api/drives/${f.demoDriveId}/hauls?open=1`,
    expect: { anonymous: 401, volunteer: 200, builder: 403, organiser: 200, otherOrganiser: 404 },
  },
  ...(["hauls", "sorts", "processing", "recycling"] as const).map(
    (what): AuthzRow => ({
      route: `app/api/drives/[id]/${what}/route.ts`,
      method: "POST",
      path: (f) => `/api/drives/${f.demoDriveId}/${what}`,
      body: () => ({ quantity: -1, bags: -1 }),
      expect: volunteerWrite,
    }),
  ),
  {
    route: "app/api/drives/[id]/stock-counts/route.ts",
    method: "POST",
    path: (f) => `/api/drives/${f.demoDriveId}/stock-counts`,
    body: () => ({ counted: {}, expected: {}, reason: "" }),
    expect: { anonymous: 401, volunteer: 403, builder: 403, organiser: 422, otherOrganiser: 404 },
    note: "a stock count overrides running totals: organisers only",
  },
  {
    route: "app/api/heaters/route.ts",
    method: "GET",
    path: () => "/api/heaters",
    expect: signedIn,
  },
  ...(["claims", "releases", "built-in"] as const).map(
    (what): AuthzRow => ({
      route: `app/api/heaters/[id]/${what}/route.ts`,
      method: "POST",
      path: (f) => `/api/heaters/${f.demoHeaterId}/${what}`,
      body: () => ({ quantity: 0 }),
      expect: builderWrite,
    }),
  ),
  {
    route: "app/api/movements/[id]/reversal/route.ts",
    method: "POST",
    path: () => `/api/movements/${movementId}/reversal`,
    expect: { anonymous: 401, volunteer: 409, builder: 403, organiser: 409, otherOrganiser: 404 },
    note: "the volunteer is the author; the builder is neither author nor organiser",
  },
  {
    route: "app/api/ledger/route.ts",
    method: "GET",
    path: (f) => `/api/ledger?driveId=${f.demoDriveId}&limit=5`,
    expect: { anonymous: 401, volunteer: 403, builder: 403, organiser: 200, otherOrganiser: 200 },
    note: "the other organiser sees only their own group's lines (filtered in SQL), none of the demo drive's",
  },
  {
    route: "app/api/ledger/route.ts",
    method: "GET",
    path: () => `/api/ledger?mine=1`,
    expect: signedIn,
  },
  {
    route: "app/api/ledger/export/route.ts",
    method: "GET",
    path: (f) => `/api/ledger/export?driveId=${f.demoDriveId}`,
    expect: { anonymous: 401, volunteer: 403, builder: 403, organiser: 200, otherOrganiser: 200 },
  },
  {
    route: "app/api/public/drives/[slug]/tallies/route.ts",
    method: "GET",
    path: (f) => `/api/public/drives/${f.demoDriveSlug}/tallies`,
    expect: { anonymous: 200, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
  },
];
