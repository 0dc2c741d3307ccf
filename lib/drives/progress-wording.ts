import { countOf } from "@/lib/plural";
import type { DriveFinish } from "./progress";

// The words shown beside a drive's progress, in one place so the public page
// and the dashboard never promise what the numbers do not say.

export const NO_HEATERS = "No heaters planned yet";

const fmt = (n: number) => n.toLocaleString("en-GB");

/** "Good cans for 1 of 3 heaters", or that no heater is planned (never "0 of 0"). */
export function heatersCoveredText(covered: number, total: number): string {
  if (total <= 0) return NO_HEATERS;
  return `Good cans for ${fmt(covered)} of ${countOf(total, "heater", fmt)}`;
}

/** What is left to find: a count, "target reached", or no target at all. */
export function remainingText(target: { cans: number; heaters: number }, remaining: number): string {
  if (target.heaters <= 0 || target.cans <= 0) return "The target appears once the organisers plan a heater.";
  if (remaining > 0) return `${countOf(remaining, "good can", fmt)} still to find.`;
  return "Target reached — thank you!";
}

/**
 * The dashboard's "Expected finish": a date only when a pace promises one for a running drive.
 * `day` writes a day in the group's style (formatter(look).day); given, not imported, so the public
 * drive page, which reads this file, takes no date formatter.
 */
export function finishText(finish: DriveFinish, day: (isoDay: string) => string): string {
  switch (finish.kind) {
    case "noTarget":
      return NO_HEATERS;
    case "reached":
      return "Target reached";
    case "ended":
      return `The drive ended on ${day(finish.endsOn)}`;
    case "notStarted":
      return `No pace yet: the drive starts on ${day(finish.startsOn)}`;
    case "noPace":
      return `No pace yet: nothing counted in the last ${countOf(finish.windowDays, "day")}`;
    case "expected":
      return finish.afterEnd && finish.endsOn ? `${day(finish.date)}, after the drive ends on ${day(finish.endsOn)}` : day(finish.date);
  }
}

/** "6 good cans a day over the last 14 days", or why there is no pace. */
export function paceText(pace: { cansPerDay: number; windowDays: number }): string {
  if (pace.windowDays <= 0) return "no pace before the drive starts";
  return `${countOf(Math.round(pace.cansPerDay), "good can", fmt)} a day over the last ${countOf(pace.windowDays, "day")}`;
}
