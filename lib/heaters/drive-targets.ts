import "server-only";
import { db } from "@/lib/db";
import { countGoodCans, driveTarget, heatersCovered, type DriveTarget } from "@/lib/drives/progress";
import { driveYieldInputs } from "@/lib/ledger/balances";

export interface DriveWithTarget {
  id: string;
  name: string;
  slug: string;
  sparePercent: number;
  unitCans: number[];
  target: DriveTarget;
  /** Counted good cans of the drive, every stage from good to built in. */
  goodCans: number;
  /** Heaters whose cans the good cans cover, in planning order. */
  covered: number;
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
    .whereNull("archived_at")
    .orderBy([{ column: "created_at" }, { column: "name" }]);
  return Promise.all(
    drives.map(async (d: { id: string; name: string; slug: string; sparePercent: number }) => {
      const unitCans = units.filter((u: { driveId: string }) => u.driveId === d.id).map((u: { cans: number }) => u.cans);
      // The drive id comes from the group-scoped query above.
      const goodCans = countGoodCans((await driveYieldInputs(d.id)).stages);
      return { ...d, unitCans, target: driveTarget(unitCans, d.sparePercent), goodCans, covered: heatersCovered(unitCans, goodCans) };
    }),
  );
}
