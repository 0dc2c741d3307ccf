/**
 * A run's state follows its stops: untouched stops mean planned, any stop
 * logged or skipped means under way, and none left pending means done.
 */
import type { RunState, StopStatus } from "./schemas";

export function runStateOf(statuses: readonly StopStatus[]): RunState {
  const pending = statuses.filter((s) => s === "pending").length;
  if (statuses.length > 0 && pending === 0) return "done";
  if (pending < statuses.length) return "under_way";
  return "planned";
}

/** Counts for a progress line such as "3 of 5 stops done". */
export function stopProgress(statuses: readonly StopStatus[]) {
  const logged = statuses.filter((s) => s === "logged").length;
  const skipped = statuses.filter((s) => s === "skipped").length;
  return { total: statuses.length, logged, skipped, pending: statuses.length - logged - skipped };
}
