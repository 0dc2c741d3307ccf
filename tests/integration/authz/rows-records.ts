import { testDb } from "@/tests/support/db";
import { expects, row } from "./row";
import type { AuthzRow } from "./types";

// Archive, restore and delete for the records around a drive (issue 16): organisers
// of the group only; another group's organiser gets 404 before the body is read.
// Archive and restore send a stray field and delete sends no confirmation, so the
// organiser gets 422 and nothing changes.
const organiserOnly = expects(401, 403, 403, 422, 404);

/**
 * One record of each kind in the demo group, made once and found again by its invented text. They are
 * made archived, so no list, public page or fill state of the demo shows them (a bare photo URL would
 * also break the public page's Content-Security-Policy check); the bodies sent are refused either way.
 */
async function demoRecords() {
  const db = testDb();
  const point = await db("drop_points as p")
    .join("drives as d", "d.id", "p.drive_id")
    .where("d.slug", "larkhollow-winter-2026")
    .where("p.name", "Larkhollow Library porch")
    .first("p.id", "p.drive_id", "p.group_id");
  const note = "Authz check: a demo record";
  const pledge =
    (await db("pledges").where({ name: note }).first("id")) ??
    (await db("pledges").insert({ group_id: point.group_id, drive_id: point.drive_id, drop_point_id: point.id, name: note, bags: 1, bring_on: "2026-12-12", archived_at: db.fn.now() }).returning("id"))[0];
  const report =
    (await db("fill_reports").where({ note }).first("id")) ??
    (await db("fill_reports").insert({ group_id: point.group_id, drop_point_id: point.id, level: 50, note, archived_at: db.fn.now() }).returning("id"))[0];
  const key = "authz-check-demo-photo";
  const photo =
    (await db("files").where({ key }).first("id")) ??
    (await db("files")
      .insert({ group_id: point.group_id, key, url: "http://127.0.0.1/f/authz-check-demo-photo", name: "porch.png", size: 10, mime: "image/png", purpose: "drop-point-photo", subject_id: point.id, archived_at: db.fn.now() })
      .returning("id"))[0];
  return { drive: point.drive_id as string, dropPoint: point.id as string, pledge: pledge.id as string, fillReport: report.id as string, photo: photo.id as string };
}
const ids = await demoRecords();

const KINDS = [
  ["drives", ids.drive],
  ["drop-points", ids.dropPoint],
  ["photos", ids.photo],
  ["pledges", ids.pledge],
  ["fill-reports", ids.fillReport],
] as const;

export const rows: AuthzRow[] = KINDS.flatMap(([folder, id]) => [
  row("POST", `${folder}/[id]/archive`, `/api/${folder}/${id}/archive`, organiserOnly, { body: () => ({ sure: "yes" }) }),
  row("POST", `${folder}/[id]/restore`, `/api/${folder}/${id}/restore`, organiserOnly, { body: () => ({ sure: "yes" }) }),
  row("POST", `${folder}/[id]/delete`, `/api/${folder}/${id}/delete`, organiserOnly, { body: () => ({}), note: "without confirm: true nothing is deleted" }),
]);

rows.push(
  row("GET", "drives/[id]/archived", (f) => `/api/drives/${f.demoDriveId}/archived`, expects(401, 403, 403, 200, 404), {
    note: "archived drop points carry the hosts' contact details, so organisers only",
  }),
);
