// Which drive a page opens on when the person has not said (pure; safe in the client).
// Dates are calendar days `YYYY-MM-DD`, which compare correctly as strings; `today`
// is the group's own day (groups.time_zone), worked out by the caller.
import { formatDayRange, formatLongDay } from "@/lib/format/dates";
import { DEFAULT_LOOK, type Look } from "@/lib/format/look";

export interface DriveSpan {
  id: string;
  name: string;
  startsOn: string;
  endsOn: string;
}

export type DriveTiming = "running" | "upcoming" | "ended";

export function driveTiming(drive: Pick<DriveSpan, "startsOn" | "endsOn">, today: string): DriveTiming {
  if (today < drive.startsOn) return "upcoming";
  if (today > drive.endsOn) return "ended";
  return "running";
}

/** Within one timing: what starts soonest first when upcoming, else what ended (or ends) latest first. */
export function byTimingOrder(timing: DriveTiming, a: Pick<DriveSpan, "startsOn" | "endsOn">, b: Pick<DriveSpan, "startsOn" | "endsOn">): number {
  return timing === "upcoming" ? a.startsOn.localeCompare(b.startsOn) : b.endsOn.localeCompare(a.endsOn);
}

/**
 * Drives split by their timing, each judged against its own group's day
 * (`today`, as drives of several groups can sit on one list), ordered as the
 * organiser's dashboard orders them.
 */
export function groupByTiming<D extends Pick<DriveSpan, "startsOn" | "endsOn"> & { today: string }>(drives: readonly D[]): Record<DriveTiming, D[]> {
  const out: Record<DriveTiming, D[]> = { running: [], upcoming: [], ended: [] };
  for (const d of drives) out[driveTiming(d, d.today)].push(d);
  for (const timing of Object.keys(out) as DriveTiming[]) out[timing].sort((a, b) => byTimingOrder(timing, a, b));
  return out;
}

const byName = (a: DriveSpan, b: DriveSpan) => (a.name < b.name ? -1 : a.name > b.name ? 1 : a.id < b.id ? -1 : 1);

/**
 * The drive running today (if several, the one that started latest), else the
 * next to start, else the one that ended most recently. A past or future drive
 * is never chosen while one is running. Ties fall to the name, so the choice
 * never depends on the order the drives were listed in.
 */
export function defaultDrive<D extends DriveSpan>(drives: readonly D[], today: string): D | undefined {
  const running = drives.filter((d) => driveTiming(d, today) === "running");
  if (running.length) return [...running].sort((a, b) => (a.startsOn === b.startsOn ? byName(a, b) : a.startsOn > b.startsOn ? -1 : 1))[0];
  const upcoming = drives.filter((d) => driveTiming(d, today) === "upcoming");
  if (upcoming.length) return [...upcoming].sort((a, b) => (a.startsOn === b.startsOn ? byName(a, b) : a.startsOn < b.startsOn ? -1 : 1))[0];
  return [...drives].sort((a, b) => (a.endsOn === b.endsOn ? byName(a, b) : a.endsOn > b.endsOn ? -1 : 1))[0];
}

/** The person's remembered drive when it is still one of the group's drives, else the default. */
export function pickDrive<D extends DriveSpan>(drives: readonly D[], today: string, ...preferred: (string | null | undefined)[]): D | undefined {
  for (const id of preferred) {
    const found = id ? drives.find((d) => d.id === id) : undefined;
    if (found) return found;
  }
  return defaultDrive(drives, today);
}

// The words come from lib/format (Intl with the group's locale); its steady() spelling
// keeps the server's and the browser's text the same ("Sep", not "Sept" from newer ICU data).

/** "1 March 2027". */
export function longDay(day: string, look: Pick<Look, "locale"> = DEFAULT_LOOK): string {
  return formatLongDay(day, look);
}

/** "1 Nov – 31 Dec 2026", or "1 Nov 2026 – 31 Jan 2027" across a new year. */
export function spanText(drive: Pick<DriveSpan, "startsOn" | "endsOn">, look: Pick<Look, "locale"> = DEFAULT_LOOK): string {
  return formatDayRange(drive.startsOn, drive.endsOn, look);
}

/** What to say plainly when entries go to a drive that is not running today; null while it runs. */
export function timingWarning(drive: Pick<DriveSpan, "startsOn" | "endsOn">, today: string, look: Pick<Look, "locale"> = DEFAULT_LOOK): string | null {
  const timing = driveTiming(drive, today);
  if (timing === "upcoming") return `This drive starts on ${longDay(drive.startsOn, look)}.`;
  if (timing === "ended") return `This drive ended on ${longDay(drive.endsOn, look)}.`;
  return null;
}
