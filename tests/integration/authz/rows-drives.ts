import { testDb } from "@/tests/support/db";
import { everyone, expects, row } from "./row";
import type { AuthzRow } from "./types";

// Drives, drop points and the public drive endpoints. Mutations send an
// invalid body, so allowed callers get 422 and nothing is written; another
// group's drive or drop point is 404 before the body is read.
const organiserOnly = expects(401, 403, 403, 422, 404);
const anyone = everyone(200);

// A pledge on the demo drive, for the organiser's mark (issue 16).
async function demoPledgeId(): Promise<string> {
  const db = testDb();
  const note = "Authz check: a demo pledge";
  const found = await db("pledges").where({ name: note }).first("id");
  if (found) return found.id;
  const point = await db("drop_points as p").join("drives as d", "d.id", "p.drive_id").join("groups as g", "g.id", "d.group_id").where("g.slug", "larkhollow-warm-rooms").first("p.id", "p.drive_id", "d.group_id");
  const [row] = await db("pledges").insert({ group_id: point.group_id, drive_id: point.drive_id, drop_point_id: point.id, name: note, bags: 1, bring_on: "2026-12-12" }).returning("id");
  return row.id;
}
const demoPledge = await demoPledgeId();

export const rows: AuthzRow[] = [
  row("POST", "drives", "/api/drives", expects(401, 403, 403, 422, 422), {
    body: () => ({ name: "" }),
    note: "each organiser creates drives in their own group",
  }),
  row("GET", "drives/[id]", (f) => `/api/drives/${f.demoDriveId}`, expects(401, 200, 200, 200, 404)),
  row("PUT", "drives/[id]", (f) => `/api/drives/${f.demoDriveId}`, organiserOnly, { body: () => ({ name: "" }) }),
  row("GET", "drives/[id]/drop-points", (f) => `/api/drives/${f.demoDriveId}/drop-points`, expects(401, 403, 403, 200, 404), {
    note: "holds the hosts' contact details, so organisers only",
  }),
  row("POST", "drives/[id]/drop-points", (f) => `/api/drives/${f.demoDriveId}/drop-points`, organiserOnly, {
    body: () => ({ name: "x", lat: 200, lng: 0, capacityBags: 0 }),
  }),
  row("PATCH", "drop-points/[id]", (f) => `/api/drop-points/${f.demoDropPointId}`, organiserOnly, { body: () => ({ lat: 95 }) }),
  row("POST", "drop-points/[id]/fill-clear", (f) => `/api/drop-points/${f.demoDropPointId}/fill-clear`, organiserOnly, {
    body: () => ({ asOf: "not a time" }),
  }),
  row("GET", "public/drives/[slug]", (f) => `/api/public/drives/${f.demoDriveSlug}`, anyone),
  row("GET", "public/drives/[slug]/drop-points", (f) => `/api/public/drives/${f.demoDriveSlug}/drop-points`, anyone),
  row("POST", "public/drives/[slug]/pledges", (f) => `/api/public/drives/${f.demoDriveSlug}/pledges`, everyone(422), {
    body: () => ({ bags: 0 }),
    note: "anyone may pledge; the invalid body writes nothing",
  }),
  row("POST", "public/drives/[slug]/drop-points/[id]/fill-reports", (f) => `/api/public/drives/${f.demoDriveSlug}/drop-points/${f.demoDropPointId}/fill-reports`, everyone(422), {
    body: () => ({ level: 33 }),
    note: "anyone at the bin may report; the invalid body writes nothing",
  }),
];

rows.push(
  row("POST", "uploadthing", "/api/uploadthing?actionType=upload&slug=fillReportPhoto", everyone([400, 404]), {
    body: () => ({ files: [{ name: "a.png", size: 10, type: "image/png", lastModified: 0 }], input: { fillReportId: "00000000-0000-4000-8000-000000000000" } }),
    note: "a fill report photo only attaches to a report made in the last 15 minutes; this one does not exist",
  }),
  // Issue 16: the donor's cancel link (anyone with the token) and the organiser's mark of a pledge.
  row("POST", "public/pledges/cancel", "/api/public/pledges/cancel", everyone(422), { body: () => ({ token: "short" }), note: "anyone holding a cancel token; the invalid token writes nothing" }),
  row("POST", "pledges/[id]/status", `/api/pledges/${demoPledge}/status`, organiserOnly, { body: () => ({ status: "lost" }), note: "only organisers mark pledges; another group's is 404" }),
);
