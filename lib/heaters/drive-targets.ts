import "server-only";
import { db } from "@/lib/db";
import { driveTarget, type DriveTarget } from "@/lib/drives/progress";

export interface DriveWithTarget {
  id: string;
  name: string;
  slug: string;
  sparePercent: number;
  unitCans: number[];
  target: DriveTarget;
}

/**
 * Each drive of the group with its target: Σ cans of its heater units plus the
 * drive's spare allowance. Units are ordered as they were planned, the order
 * in which they get cans.
 */
export async function listDriveTargets(groupId: string, driveId?: string): Promise<DriveWithTarget[]> {
  const drives = await db("drives")
    .select("id", "name", "slug", db.raw('spare_percent::float as "sparePercent"'))
    .where({ group_id: groupId })
    .modify((q) => {
      if (driveId) q.andWhere({ id: driveId });
    })
    .orderBy([{ column: "starts_on", order: "desc" }, { column: "name" }]);
  const units = await db("heater_units")
    .select("drive_id as driveId", "cans")
    .where({ group_id: groupId })
    .whereNotNull("drive_id")
    .orderBy([{ column: "created_at" }, { column: "name" }]);
  return drives.map((d: { id: string; name: string; slug: string; sparePercent: number }) => {
    const unitCans = units.filter((u: { driveId: string }) => u.driveId === d.id).map((u: { cans: number }) => u.cans);
    return { ...d, unitCans, target: driveTarget(unitCans, d.sparePercent) };
  });
}
