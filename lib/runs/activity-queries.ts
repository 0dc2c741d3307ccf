import "server-only";
import { db } from "@/lib/db";
import { AppError } from "@/lib/api/errors";
import type { HaulSample } from "./suggest";
import { RECENT_HAULS } from "./suggest";

// Hauls belong to the ledger and fill reports to the drop-point area; runs only read them.

/** The last few hauls of each drop point, newest first. */
export async function recentHauls(groupId: string, dropPointIds: string[]): Promise<Map<string, HaulSample[]>> {
  const out = new Map<string, HaulSample[]>();
  if (dropPointIds.length === 0) return out;
  const rows = await db
    .select("drop_point_id", "bags", "at")
    .from(
      db("hauls")
        .select(
          "drop_point_id",
          "bags",
          "hauled_at as at",
          db.raw("row_number() over (partition by drop_point_id order by hauled_at desc) as n"),
        )
        .where("group_id", groupId)
        .whereNull("reversed_at")
        .whereIn("drop_point_id", dropPointIds)
        .as("h"),
    )
    .where("n", "<=", RECENT_HAULS)
    .orderBy([{ column: "drop_point_id" }, { column: "at", order: "desc" }]);
  for (const r of rows) {
    out.set(r.drop_point_id, [...(out.get(r.drop_point_id) ?? []), { at: r.at as Date, bags: r.bags as number }]);
  }
  return out;
}

/** The newest fill report of each drop point, as a share of the bin (reports give percent). */
export async function latestFillReports(
  groupId: string,
  dropPointIds: string[],
): Promise<Map<string, { fraction: number; at: Date }>> {
  const out = new Map<string, { fraction: number; at: Date }>();
  if (dropPointIds.length === 0) return out;
  const rows = await db("fill_reports")
    .distinctOn("drop_point_id")
    .select("drop_point_id", db.raw("level / 100.0 as fraction"), "created_at as at")
    .where("group_id", groupId)
    .whereNull("archived_at")
    .whereIn("drop_point_id", dropPointIds)
    .orderBy([{ column: "drop_point_id" }, { column: "created_at", order: "desc" }]);
  for (const r of rows) out.set(r.drop_point_id, { fraction: r.fraction as number, at: r.at as Date });
  return out;
}

/** 422 unless the haul exists in the group and was taken at this drive's drop point. */
export async function assertHaulAtStop(groupId: string, driveId: string, dropPointId: string, haulId: string) {
  const haul = await db("hauls")
    .select("id")
    .where({ id: haulId, group_id: groupId, drive_id: driveId, drop_point_id: dropPointId })
    .whereNull("reversed_at")
    .first();
  if (!haul) {
    throw new AppError("invalid_input", "That haul was not logged at this stop.", {
      fields: { haulId: "Log the haul at this drop point first" },
    });
  }
}
