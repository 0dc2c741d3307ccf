import "server-only";
import { db } from "@/lib/db";
import { listDropPoints, listFillReports, listPledges } from "@/lib/drives/queries";
import { ARCHIVED_SHOWN, type ArchivedOfDrive, type ArchivedPhoto } from "./types";

/**
 * The drive's archived photos: a drop point's own, and those of its fill reports (their
 * drop point found through the report). Both purposes can be archived (lib/records/resource.ts).
 */
function archivedPhotos(groupId: string, driveId: string) {
  return db("files as f")
    .leftJoin("fill_reports as r", function () {
      this.on("r.id", "=", "f.subject_id").andOn("r.group_id", "=", "f.group_id").andOnVal("f.purpose", "=", "fill-report-photo");
    })
    .join("drop_points as p", function () {
      this.on(db.raw("p.id = case f.purpose when 'fill-report-photo' then r.drop_point_id else f.subject_id end")).andOn("p.group_id", "=", "f.group_id");
    })
    .where({ "f.group_id": groupId, "p.drive_id": driveId })
    .whereIn("f.purpose", ["drop-point-photo", "fill-report-photo"])
    .whereNotNull("f.archived_at");
}

async function countArchivedFillReports(groupId: string, driveId: string): Promise<number> {
  const row = await db("fill_reports as f")
    .join("drop_points as p", "p.id", "f.drop_point_id")
    .where({ "f.group_id": groupId, "p.drive_id": driveId })
    .whereNotNull("f.archived_at")
    .first<{ n: number }>(db.raw("count(*)::int as n"));
  return row?.n ?? 0;
}

/**
 * Everything archived on one drive of the group (issue 16's "archived" view), each list filtered by
 * the group in SQL. Fill reports and photos pile up, so each lists its newest ARCHIVED_SHOWN and
 * `totals` says how many there are in all.
 */
export async function listArchivedOfDrive(groupId: string, driveId: string): Promise<ArchivedOfDrive> {
  const [dropPoints, pledges, fillReports, photos] = await Promise.all([
    listDropPoints(groupId, driveId, "archived"),
    listPledges(groupId, driveId, "archived"),
    listFillReports(groupId, driveId, ARCHIVED_SHOWN, "archived"),
    archivedPhotos(groupId, driveId)
      .select(
        "f.id",
        "f.url",
        "f.name",
        db.raw(`case f.purpose when 'fill-report-photo' then 'fillReport' else 'dropPoint' end as "of"`),
        "p.id as dropPointId",
        "p.name as dropPointName",
      )
      .orderBy([{ column: "f.created_at", order: "desc" }, { column: "f.id" }])
      .limit(ARCHIVED_SHOWN) as Promise<ArchivedPhoto[]>,
  ]);
  // Counted only when a list stopped at its limit; a shorter list is all there is.
  const [fillReportCount, photoCount] = await Promise.all([
    fillReports.length < ARCHIVED_SHOWN ? fillReports.length : countArchivedFillReports(groupId, driveId),
    photos.length < ARCHIVED_SHOWN ? photos.length : archivedPhotos(groupId, driveId).first<{ n: number }>(db.raw("count(*)::int as n")).then((r) => r?.n ?? 0),
  ]);
  return {
    dropPoints,
    pledges,
    fillReports,
    photos,
    totals: { dropPoints: dropPoints.length, pledges: pledges.length, fillReports: fillReportCount, photos: photoCount },
  };
}
