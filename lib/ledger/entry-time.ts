/**
 * When a movement happened, as the phone that recorded it says. An entry kept
 * offline is sent hours later; it is recorded at the time it was entered,
 * within bounds the server can vouch for.
 */
import { AppError } from "@/lib/api/errors";
import { formatMoment, formatTime, localDay } from "@/lib/format/dates";
import type { Look } from "@/lib/format/look";

/**
 * How far ahead of the server a phone's clock may be. Phones set their clocks
 * from the network, so minutes of drift are rare; 5 minutes covers a phone
 * that has been offline for days without accepting times that have not happened.
 */
export const CLOCK_SKEW_MS = 5 * 60_000;

/**
 * A drive's start is a calendar date; an entry on that day is in time in every
 * time zone, the earliest of which is UTC+14 (Line Islands, from memory).
 */
export const EARLIEST_ZONE_OFFSET_MS = 14 * 3_600_000;

/**
 * Older than five years is a wrong clock or a mistyped year, not a phone left
 * offline nor an organiser typing up a past drive's paper tally (no published
 * source; the drive's own start is the usual, tighter bound).
 */
export const MAX_AGE_MS = 5 * 366 * 86_400_000;

/** The ledger shows the time it was received next to the time it happened when they differ by more than this. */
export const SHOW_RECEIVED_AFTER_MS = 60_000;

/** Why `at` cannot be when something happened on a drive starting `driveStartsOn` (YYYY-MM-DD), or null. */
export function entryTimeProblem(at: Date, now: Date, driveStartsOn: string): string | null {
  const t = at.getTime();
  if (!Number.isFinite(t)) return "Use a date and time like 2026-12-02T09:30:00Z.";
  if (t > now.getTime() + CLOCK_SKEW_MS) {
    return "That time is in the future. Check the clock on this phone, then send the entry again.";
  }
  if (t < now.getTime() - MAX_AGE_MS) return "That time is more than five years ago. Check the date.";
  const start = Date.parse(`${driveStartsOn}T00:00:00Z`) - EARLIEST_ZONE_OFFSET_MS;
  if (t < start) return `That time is before the drive started (${driveStartsOn}). Check the date or the drive.`;
  return null;
}

/**
 * The time to record: the one the request gave (field `field`), checked, or
 * now. An out-of-bounds time is a 422 on that field.
 */
export function entryTime(given: string | undefined, field: string, driveStartsOn: string, now = new Date()): Date {
  if (!given) return now;
  const at = new Date(given);
  const problem = entryTimeProblem(at, now, driveStartsOn);
  if (problem) throw new AppError("invalid_input", "Some fields need another look.", { fields: { [field]: problem } });
  return at;
}

/** True when a line was received long enough after it happened to say both. */
export function receivedLater(occurredAt: string, recordedAt: string): boolean {
  return Date.parse(recordedAt) - Date.parse(occurredAt) > SHOW_RECEIVED_AFTER_MS;
}

/** "sent 16:00" (or "sent 3 Dec 2026, 16:00" on another day) when received more than a minute after it happened, else null. */
export function sentLabel(occurredAt: string, recordedAt: string, look: Pick<Look, "timeZone" | "locale">): string | null {
  if (!receivedLater(occurredAt, recordedAt)) return null;
  const sameDay = localDay(occurredAt, look.timeZone) === localDay(recordedAt, look.timeZone);
  return `sent ${sameDay ? formatTime(recordedAt, look) : formatMoment(recordedAt, look)}`;
}
