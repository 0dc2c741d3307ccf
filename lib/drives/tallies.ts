import "server-only";
// The one place the drive pages read the ledger's running totals.
import { driveGoodDaily, driveYieldInputs, lastHaulAt, type DropPointTally } from "@/lib/ledger/balances";
import { addDays, DEFAULT_PACE_WINDOW_DAYS, driveProgress, type DriveProgress } from "@/lib/drives/progress";

export type { DropPointTally };

export async function progressFor(drive: { id: string; startsOn: string; endsOn: string; sparePercent: number }, unitCans: number[], today: string): Promise<DriveProgress> {
  const [inputs, daily] = await Promise.all([driveYieldInputs(drive.id), driveGoodDaily(drive.id, addDays(today, -DEFAULT_PACE_WINDOW_DAYS))]);
  return driveProgress({ unitCans, ...inputs, daily, today, startsOn: drive.startsOn, endsOn: drive.endsOn, sparePercent: drive.sparePercent });
}

/** Time of the latest haul at each drop point that has one. */
export async function lastHauls(dropPointIds: string[]): Promise<Record<string, Date>> {
  const at = await lastHaulAt(dropPointIds);
  const out: Record<string, Date> = {};
  for (const [id, iso] of Object.entries(at)) if (iso) out[id] = new Date(iso);
  return out;
}
