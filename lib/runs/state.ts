// A run's state (planned, under way, done) follows its stops in the database:
// pickup_run_follow_stops in db/functions/ledger_writers.sql is the one rule.
import type { StopStatus } from "./schemas";

/** Counts for a progress line such as "3 of 5 stops done". */
export function stopProgress(statuses: readonly StopStatus[]) {
  const logged = statuses.filter((s) => s === "logged").length;
  const skipped = statuses.filter((s) => s === "skipped").length;
  return { total: statuses.length, logged, skipped, pending: statuses.length - logged - skipped };
}
