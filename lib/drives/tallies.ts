import "server-only";
// The one place the drive pages read the ledger's running totals.
import { driveGoodDaily, dropPointTallies, driveYieldInputs, lastHaulAt, type DropPointTally } from "@/lib/ledger/balances";
import { addDays, DEFAULT_PACE_WINDOW_DAYS, driveProgress, type DriveProgress } from "@/lib/drives/progress";

export type { DropPointTally };

export const EMPTY_TALLY: DropPointTally = { hauls: 0, bags: 0, goodCans: 0, rejectedCans: 0 };

export async function tallies(driveId: string): Promise<Record<string, DropPointTally>> {
  return dropPointTallies(driveId);
}

export async function progressFor(drive: { id: string; startsOn: string; sparePercent: number }, unitCans: number[], today: string): Promise<DriveProgress> {
  const [inputs, daily] = await Promise.all([driveYieldInputs(drive.id), driveGoodDaily(drive.id, addDays(today, -DEFAULT_PACE_WINDOW_DAYS))]);
  return driveProgress({ unitCans, ...inputs, daily, today, startsOn: drive.startsOn, sparePercent: drive.sparePercent });
}

/** Time of the latest haul at each drop point that has one. */
export async function lastHauls(dropPointIds: string[]): Promise<Record<string, Date>> {
  const at = await lastHaulAt(dropPointIds);
  const out: Record<string, Date> = {};
  for (const [id, iso] of Object.entries(at)) if (iso) out[id] = new Date(iso);
  return out;
}
