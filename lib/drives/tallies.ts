import "server-only";
// The one place the drive pages read the ledger's running totals.
import { driveProgress, type DriveProgress } from "@/lib/drives/progress";
import { dropPointTallies } from "@/lib/ledger/balances";

export interface DropPointTally {
  hauls: number;
  bags: number;
  goodCans: number;
  rejectedCans: number;
}

export const EMPTY_TALLY: DropPointTally = { hauls: 0, bags: 0, goodCans: 0, rejectedCans: 0 };

export async function tallies(driveId: string): Promise<Record<string, DropPointTally>> {
  return dropPointTallies(driveId);
}

export async function progressFor(drive: { id: string; startsOn: string; sparePercent: number }, unitCans: number[], today: string): Promise<DriveProgress> {
  return driveProgress({
    unitCans,
    stages: { good: 0, washed: 0, opened: 0, punched: 0, claimed: 0, builtIn: 0 },
    rejectedCans: 0,
    hauledEstimate: 0,
    daily: [],
    today,
    startsOn: drive.startsOn,
    sparePercent: drive.sparePercent,
  });
}

/** Time of the latest haul at each drop point (none yet). */
export async function lastHauls(_dropPointIds: string[]): Promise<Record<string, Date>> {
  return {};
}
