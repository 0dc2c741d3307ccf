/**
 * "This bin is full" episodes. A fill episode at a drop point runs from its
 * last haul (or from the start) to the next haul. The first report at or
 * above three quarters in an episode alerts the organisers; later reports in
 * the same episode do not.
 */
import { countOf } from "@/lib/plural";
export const ALERT_LEVEL = 75;

/** The levels a report may give (percent full). Here, not in schemas.ts, so the public page needs no zod. */
export const FILL_LEVELS = [0, 25, 50, 75, 100] as const;

export function shouldAlert(level: number, lastAlertAt: Date | null, lastHaulAt: Date | null): boolean {
  if (level < ALERT_LEVEL) return false;
  if (!lastAlertAt) return true;
  return lastHaulAt !== null && lastHaulAt.getTime() > lastAlertAt.getTime();
}

export const LEVEL_LABEL: Record<number, string> = {
  0: "Empty",
  25: "About a quarter full",
  50: "About half full",
  75: "About three quarters full",
  100: "Full — no room left",
};

/**
 * Bin fill as state: a drop point's fill is its newest report made after the
 * bin's last haul and after an organiser last cleared it; before any report
 * (or once hauled or cleared) it is unknown, shown as "no report".
 */
export interface FillState {
  level: number;
  reportedAt: string;
}

export function currentFill(
  reports: { level: number; at: Date }[],
  lastHaulAt: Date | null,
  clearedAt: Date | null,
): FillState | null {
  const since = Math.max(lastHaulAt?.getTime() ?? -Infinity, clearedAt?.getTime() ?? -Infinity);
  const newest = reports.filter((r) => r.at.getTime() > since).sort((a, b) => b.at.getTime() - a.at.getTime())[0];
  return newest ? { level: newest.level, reportedAt: newest.at.toISOString() } : null;
}

/**
 * The same rule in SQL, as a lateral join for a drop point aliased `p`:
 * yields `fill_level` and `fill_at`, or nulls. Only hauls still standing
 * (not undone) end a fill episode.
 */
export const CURRENT_FILL_LATERAL = `left join lateral (
    select fr.level as fill_level, fr.created_at as fill_at from fill_reports fr
     where fr.drop_point_id = p.id and fr.archived_at is null
       and fr.created_at > coalesce(greatest(p.fill_cleared_at,
             (select max(h.hauled_at) from hauls h where h.drop_point_id = p.id and h.reversed_at is null)), '-infinity')
     order by fr.created_at desc limit 1) cf on true`;

/** How the bin looks, by shape and by word, so the map and list never rely on colour alone. */
export type FillShape = "unknown" | "empty" | "part" | "full";

export function fillShape(level: number | null | undefined): FillShape {
  if (level === null || level === undefined) return "unknown";
  if (level >= ALERT_LEVEL) return "full";
  if (level > 0) return "part";
  return "empty";
}

export const FILL_SHAPE_LABEL: Record<FillShape, string> = {
  unknown: "no recent report",
  empty: "reported empty",
  part: "part full",
  full: "reported full",
};

/** "3 hours ago", "2 days ago": how long ago a report came in (plurals by Intl.PluralRules, lib/plural; no date formatter on the drive page). */
export function timeAgo(iso: string, now: Date = new Date()): string {
  const minutes = Math.max(0, Math.round((now.getTime() - new Date(iso).getTime()) / 60_000));
  if (minutes < 1) return "just now";
  if (minutes < 60) return `${countOf(minutes, "minute")} ago`;
  const hours = Math.round(minutes / 60);
  if (hours < 48) return `${countOf(hours, "hour")} ago`;
  return `${countOf(Math.round(hours / 24), "day")} ago`;
}
