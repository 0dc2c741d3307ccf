import "server-only";
import { sendRunReminders } from "./run-reminders";
import { sendUnitReadyNotes } from "./unit-ready";
import { sendWeeklySummaries } from "./weekly-summary";

export interface SweepResult {
  runReminders: number;
  weeklySummaries: number;
  unitReady: number;
}

/**
 * Everything due at `now`: the worker (lib/notify/work.ts) calls it on a
 * schedule with the clock's time; tests call it with the moment they choose.
 * `groupIds` keeps a test's sweep to its own groups; the worker passes none.
 * Each notification is claimed before it is sent (lib/notify/send.ts), so
 * running it twice, or on two servers at once, sends nothing twice.
 */
export async function runNotificationSweep(now: Date = new Date(), groupIds?: readonly string[]): Promise<SweepResult> {
  const runReminders = await sendRunReminders(now, groupIds);
  const weeklySummaries = await sendWeeklySummaries(now, groupIds);
  const unitReady = await sendUnitReadyNotes(groupIds);
  return { runReminders, weeklySummaries, unitReady };
}
