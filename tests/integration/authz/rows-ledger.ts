import { testDb } from "@/tests/support/db";
import { everyone, expects, row } from "./row";
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

const signedIn = expects(401, 200, 200, 200, 200);
const volunteerWrite = expects(401, 422, 403, 422, 404);
const builderWrite = expects(401, 403, 422, 422, 404);

export const rows: AuthzRow[] = [
  row("GET", "drives/[id]/stock", (f) => `/api/drives/${f.demoDriveId}/stock`, expects(401, 200, 200, 200, 404)),
  row("GET", "drives/[id]/hauls", (f) => `/api/drives/${f.demoDriveId}/hauls?open=1`, expects(401, 200, 403, 200, 404)),
  ...(["hauls", "sorts", "processing", "recycling"] as const).map((what) =>
    row("POST", `drives/[id]/${what}`, (f) => `/api/drives/${f.demoDriveId}/${what}`, volunteerWrite, { body: () => ({ quantity: -1, bags: -1 }) }),
  ),
  row("POST", "drives/[id]/stock-counts", (f) => `/api/drives/${f.demoDriveId}/stock-counts`, expects(401, 403, 403, 422, 404), {
    body: () => ({ counted: {}, expected: {}, reason: "" }),
    note: "a stock count overrides running totals: organisers only",
  }),
  row("GET", "heaters", "/api/heaters", signedIn),
  ...(["claims", "releases", "built-in"] as const).map((what) =>
    row("POST", `heaters/[id]/${what}`, (f) => `/api/heaters/${f.demoHeaterId}/${what}`, builderWrite, { body: () => ({ quantity: 0 }) }),
  ),
  row("POST", "movements/[id]/reversal", `/api/movements/${movementId}/reversal`, expects(401, 409, 403, 409, 404), {
    note: "the volunteer is the author; the builder is neither author nor organiser",
  }),
  row("GET", "ledger", (f) => `/api/ledger?driveId=${f.demoDriveId}&limit=5`, expects(401, 403, 403, 200, 200), {
    note: "the other organiser sees only their own group's lines (filtered in SQL), none of the demo drive's",
  }),
  row("GET", "ledger", `/api/ledger?mine=1`, signedIn),
  row("GET", "ledger/export", (f) => `/api/ledger/export?driveId=${f.demoDriveId}`, expects(401, 403, 403, 200, 200)),
  row("GET", "public/drives/[slug]/tallies", (f) => `/api/public/drives/${f.demoDriveSlug}/tallies`, everyone(200)),
];
