/**
 * Which drop points a run should visit first. Pure: the caller gathers each
 * point's hauls and latest fill report.
 *
 * Order: points reported at least three-quarters full since their last haul
 * come first (fullest first); then the longest since their last haul (never
 * hauled counts as longest), ties broken by the fill expected from the pace of
 * recent hauls.
 */

/** A fill report at or above this share of the bin is "full enough to fetch". */
export const FULL_REPORT_THRESHOLD = 0.75;
/** How many recent hauls set the pace; older ones describe a different season. */
export const RECENT_HAULS = 5;

const DAY_MS = 86_400_000;

export interface HaulSample {
  at: Date;
  bags: number;
}

export interface PointActivity {
  id: string;
  capacityBags: number;
  /** Newest first or in any order; only the most recent RECENT_HAULS are used. */
  hauls: readonly HaulSample[];
  latestFillReport?: { fraction: number; at: Date } | null;
}

export interface Suggestion {
  id: string;
  lastHaulAt: Date | null;
  daysSinceHaul: number | null;
  /** Bags per day between hauls, from recent hauls; null with fewer than two. */
  bagsPerDay: number | null;
  /** Expected share of the bin filled now (may exceed 1: the bin overflows); null when unknown. */
  expectedFill: number | null;
  /** The share reported since the last haul, when there is such a report. */
  reportedFill: number | null;
  reportedFull: boolean;
  /** Worth preselecting in the planner. */
  suggested: boolean;
}

/**
 * Each haul after the first empties what gathered since the one before, so the
 * pace is the bags of the later hauls over the time they span.
 */
export function bagsPerDay(hauls: readonly HaulSample[]): number | null {
  const recent = [...hauls].sort((a, b) => b.at.getTime() - a.at.getTime()).slice(0, RECENT_HAULS);
  if (recent.length < 2) return null;
  const newest = recent[0]!.at.getTime();
  const oldest = recent[recent.length - 1]!.at.getTime();
  const days = (newest - oldest) / DAY_MS;
  if (days <= 0) return null;
  const bags = recent.slice(0, -1).reduce((sum, h) => sum + h.bags, 0);
  return bags / days;
}

export function assessPoint(point: PointActivity, now: Date): Suggestion {
  const lastHaul = point.hauls.reduce<Date | null>((latest, h) => (!latest || h.at > latest ? h.at : latest), null);
  const daysSinceHaul = lastHaul ? Math.max(0, (now.getTime() - lastHaul.getTime()) / DAY_MS) : null;
  const pace = bagsPerDay(point.hauls);
  const expectedFill =
    pace !== null && daysSinceHaul !== null && point.capacityBags > 0 ? (pace * daysSinceHaul) / point.capacityBags : null;
  const report = point.latestFillReport;
  const reportCounts = report && (!lastHaul || report.at > lastHaul);
  const reportedFill = reportCounts ? report.fraction : null;
  const reportedFull = reportedFill !== null && reportedFill >= FULL_REPORT_THRESHOLD;
  return {
    id: point.id,
    lastHaulAt: lastHaul,
    daysSinceHaul,
    bagsPerDay: pace,
    expectedFill,
    reportedFill,
    reportedFull,
    suggested: reportedFull || lastHaul === null || (expectedFill ?? 0) >= FULL_REPORT_THRESHOLD,
  };
}

export function rankSuggestions(points: readonly PointActivity[], now: Date): Suggestion[] {
  return points
    .map((p) => assessPoint(p, now))
    .sort((a, b) => {
      if (a.reportedFull !== b.reportedFull) return a.reportedFull ? -1 : 1;
      if (a.reportedFull && b.reportedFull) return b.reportedFill! - a.reportedFill!;
      const da = a.daysSinceHaul ?? Infinity;
      const dbDays = b.daysSinceHaul ?? Infinity;
      if (da !== dbDays) return dbDays - da;
      return (b.expectedFill ?? -1) - (a.expectedFill ?? -1);
    });
}
