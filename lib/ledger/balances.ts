import "server-only";
import { db } from "@/lib/db";
import { cachedRead } from "@/lib/cache/read-cache";
import { notFound } from "@/lib/api/errors";
import type { GoodStageBalances } from "@/lib/drives/progress";
import { TALLY_REASONS, type DriveStock, type TallyReason } from "./schemas";

// Reads of the running totals; none of them scans the ledger.

export interface DropPointTally {
  hauls: number;
  bags: number;
  goodCans: number;
  rejectedCans: number;
}

async function driveTotals(driveId: string): Promise<Record<string, number>> {
  const rows = await db("stage_balances").select("stage", "quantity").where({ drive_id: driveId }).whereNull("drop_point_id").whereNull("heater_unit_id");
  return Object.fromEntries(rows.map((r) => [r.stage, r.quantity]));
}

async function rejectedByReason(driveId: string): Promise<Record<TallyReason, number>> {
  const rows = await db("reject_tallies").select("reason", "quantity").where({ drive_id: driveId }).whereNull("drop_point_id");
  const out = Object.fromEntries(TALLY_REASONS.map((r) => [r, 0])) as Record<TallyReason, number>;
  for (const r of rows) out[r.reason as TallyReason] = r.quantity;
  return out;
}

/** The contract's stock shape; another group's drive is 404. */
export async function driveStock(groupId: string, driveId: string): Promise<DriveStock> {
  return cachedRead(`stock:${groupId}:${driveId}`, () => loadDriveStock(groupId, driveId));
}

async function loadDriveStock(groupId: string, driveId: string): Promise<DriveStock> {
  const drive = await db("drives").select("id").where({ id: driveId, group_id: groupId }).first();
  if (!drive) throw notFound("That drive");
  const t = await driveTotals(driveId);
  const of = (s: string) => t[s] ?? 0;
  const claimed = of("claimed");
  return {
    stages: { hauled: of("hauled"), good: of("good"), washed: of("washed"), opened: of("opened"), punched: of("punched"), builtIn: of("builtIn"), recycled: of("recycled") },
    rejected: await rejectedByReason(driveId),
    rejectedOnHand: of("rejected"),
    claimed,
    unclaimed: of("good") + of("washed") + of("opened") + of("punched") - claimed,
  };
}

/** Public-safe tallies of every drop point of the drive (zeros where nothing was hauled yet). */
export async function dropPointTallies(driveId: string): Promise<Record<string, DropPointTally>> {
  const rows = await db("drop_points as p")
    .leftJoin("drop_point_tallies as t", "t.drop_point_id", "p.id")
    .select("p.id", "t.hauls", "t.bags", "t.good_cans", "t.rejected_cans")
    .where("p.drive_id", driveId);
  return Object.fromEntries(
    rows.map((r) => [
      r.id,
      { hauls: r.hauls ?? 0, bags: r.bags ?? 0, goodCans: r.good_cans ?? 0, rejectedCans: r.rejected_cans ?? 0 },
    ]),
  );
}

/** Good cans counted per day (UTC calendar), net of undos, from `sinceDate` (YYYY-MM-DD) on. */
export async function driveGoodDaily(driveId: string, sinceDate: string): Promise<{ date: string; goodCans: number }[]> {
  const rows = await db("drive_daily_good")
    .select("day as date", "good_cans")
    .where({ drive_id: driveId })
    .andWhere("day", ">=", sinceDate)
    .orderBy("day");
  return rows.map((r) => ({ date: r.date, goodCans: r.good_cans }));
}

/** Cans claimed (still reserved) and built in, per heater unit of the group. */
export async function heaterClaims(groupId: string, driveId?: string): Promise<Record<string, { claimed: number; builtIn: number }>> {
  const rows = await db("stage_balances")
    .select("heater_unit_id", "stage", "quantity")
    .where({ group_id: groupId })
    .whereNotNull("heater_unit_id")
    .whereIn("stage", ["claimed", "builtIn"])
    .modify((q) => {
      if (driveId) q.andWhere("drive_id", driveId);
    });
  const out: Record<string, { claimed: number; builtIn: number }> = {};
  for (const r of rows) {
    const entry = (out[r.heater_unit_id!] ??= { claimed: 0, builtIn: 0 }); // whereNotNull above
    if (r.stage === "claimed") entry.claimed = r.quantity;
    else entry.builtIn = r.quantity;
  }
  return out;
}

/** When each drop point was last hauled from (undone hauls do not count). */
export async function lastHaulAt(dropPointIds: readonly string[]): Promise<Record<string, string | null>> {
  const out: Record<string, string | null> = Object.fromEntries(dropPointIds.map((id) => [id, null]));
  if (dropPointIds.length === 0) return out;
  const rows = await db("hauls")
    .select("drop_point_id")
    .max({ at: "hauled_at" })
    .whereIn("drop_point_id", dropPointIds)
    .whereNull("reversed_at")
    .groupBy("drop_point_id");
  for (const r of rows as { drop_point_id: string; at: Date | null }[]) out[r.drop_point_id] = r.at ? new Date(r.at).toISOString() : null;
  return out;
}

/** What driveProgress() needs from the ledger. Claims are a reservation, so `claimed` is 0 here. */
export async function driveYieldInputs(driveId: string): Promise<{ stages: GoodStageBalances; rejectedCans: number; hauledEstimate: number }> {
  const t = await driveTotals(driveId);
  const of = (s: string) => t[s] ?? 0;
  const rejected = await rejectedByReason(driveId);
  return {
    stages: { good: of("good"), washed: of("washed"), opened: of("opened"), punched: of("punched"), claimed: 0, builtIn: of("builtIn") },
    rejectedCans: Object.values(rejected).reduce((s, n) => s + n, 0),
    hauledEstimate: of("hauled"),
  };
}
