import "server-only";
import { db } from "@/lib/db";
import { listDropPoints, listFillReports, listPledges } from "@/lib/drives/queries";
import type { ArchivedOfDrive } from "./types";

/** Everything archived on one drive of the group (issue 16's "archived" view), each list filtered by the group in SQL. */
export async function listArchivedOfDrive(groupId: string, driveId: string): Promise<ArchivedOfDrive> {
  const [dropPoints, pledges, fillReports, photos] = await Promise.all([
    listDropPoints(groupId, driveId, "archived"),
    listPledges(groupId, driveId, "archived"),
    listFillReports(groupId, driveId, 100, "archived"),
    db("files as f")
      .join("drop_points as p", function () {
        this.on("p.id", "=", "f.subject_id").andOn("p.group_id", "=", "f.group_id");
      })
      .select("f.id", "f.url", "f.name", "p.id as dropPointId", "p.name as dropPointName")
      .where({ "f.group_id": groupId, "p.drive_id": driveId, "f.purpose": "drop-point-photo" })
      .whereNotNull("f.archived_at")
      .orderBy("f.created_at"),
  ]);
  return { dropPoints, pledges, fillReports, photos };
}
