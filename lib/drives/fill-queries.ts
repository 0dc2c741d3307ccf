import "server-only";
import { db } from "@/lib/db";
import { notFound } from "@/lib/api/errors";
import { ALERT_LEVEL, CURRENT_FILL_LATERAL } from "./fill";
import type { FullBin } from "./types";

export type { FullBin };

/** Every active drop point of the drive whose current fill is at the alert level or above, once each, longest waiting first. */
export async function listFullBins(groupId: string, driveId: string): Promise<FullBin[]> {
  const { rows } = await db.raw(
    `select p.id, p.name, cf.fill_level, cf.fill_at
       from drop_points p ${CURRENT_FILL_LATERAL}
      where p.group_id = ? and p.drive_id = ? and p.active and p.archived_at is null and cf.fill_level >= ?
      order by cf.fill_at, p.name`,
    [groupId, driveId, ALERT_LEVEL],
  );
  return rows.map((r: Record<string, unknown>) => ({
    dropPointId: r.id as string,
    dropPointName: r.name as string,
    level: r.fill_level as number,
    reportedAt: new Date(r.fill_at as string).toISOString(),
  }));
}

/**
 * The organiser marks a bin as dealt with. `asOf` (the report they saw) keeps
 * a report that arrived after they looked from being cleared unseen.
 */
export async function clearFill(groupId: string, dropPointId: string, asOf?: string) {
  const [row] = await db("drop_points")
    .where({ id: dropPointId, group_id: groupId })
    // Reports carry microseconds, the ISO time the page saw only milliseconds: the report of that millisecond counts as seen.
    .update({ fill_cleared_at: asOf ? db.raw("least(now(), ?::timestamptz + interval '1 millisecond')", [asOf]) : db.fn.now() })
    .returning(["id", "fill_cleared_at"]);
  // The update just set it, so it is never null here.
  if (!row?.fill_cleared_at) throw notFound("That drop point");
  return { dropPointId: row.id, clearedAt: row.fill_cleared_at.toISOString() };
}
