/**
 * Warnings on a pickup run, never blocks (issue 16): a stop closed on the
 * run's day by its opening hours, a haul logged on another day than the
 * run's. The rules are lib/drives/opening-hours.ts; this only words them.
 */
import { haulDayMismatch, ISO_WEEKDAY_LABELS, isoWeekday } from "@/lib/drives/opening-hours";
import type { RunDetail, RunWarning } from "./types";

export function closedStopWarnings(run: Pick<RunDetail, "plannedOn" | "stopList" | "state">): RunWarning[] {
  if (run.state === "cancelled" || run.state === "done") return [];
  const weekday = ISO_WEEKDAY_LABELS[isoWeekday(run.plannedOn)];
  return run.stopList
    .filter((s) => s.status === "pending" && s.openOnRunDay === false)
    .map((s) => ({
      kind: "closedOnRunDay" as const,
      stopId: s.id,
      message: `${s.dropPoint.name} is not open on ${weekday}s by its opening hours.`,
    }));
}

/** The haul's day in the group's time zone is not the run's day. */
export function haulDayWarning(runDate: string, loggedAt: Date, timeZone: string, stopId?: string): RunWarning[] {
  if (!haulDayMismatch(runDate, loggedAt, timeZone)) return [];
  return [{ kind: "haulOffRunDay", stopId, message: `This haul is logged on another day than the run's (${runDate}).` }];
}
