/**
 * Dates and moments every input schema accepts. A calendar-valid string can
 * still be nonsense for a can drive (year 0000 is not even a PostgreSQL date,
 * so it used to reach the database and fail there as a 500): one window,
 * checked before anything is written, answers a 422 with one message.
 * Safe to import in the client.
 */
import { z } from "zod";

export const EARLIEST_DAY = "2000-01-01";
export const LATEST_DAY = "2100-12-31";
export const DATE_RANGE_MESSAGE = "Use a date between 2000 and 2100.";

const EARLIEST_MS = Date.UTC(2000, 0, 1);
// Exclusive: the first instant after 2100-12-31 ends, in UTC.
const AFTER_LATEST_MS = Date.UTC(2101, 0, 1);

/** A `YYYY-MM-DD` string is in the window; ISO dates compare correctly as strings. */
export function isDayInWindow(day: string): boolean {
  return day >= EARLIEST_DAY && day <= LATEST_DAY;
}

/** An instant (any ISO date-time with an offset) falls within the window, in UTC. */
export function isMomentInWindow(value: string): boolean {
  const ms = Date.parse(value);
  return ms >= EARLIEST_MS && ms < AFTER_LATEST_MS;
}

const DAY_SHAPE = /^\d{4}-\d{2}-\d{2}$/;

function isCalendarDay(value: string): boolean {
  const ms = Date.parse(`${value}T00:00:00Z`);
  return !Number.isNaN(ms) && new Date(ms).toISOString().startsWith(value);
}

/**
 * A calendar day like 2026-11-01. `formatMessage` is the schema's own word for
 * a malformed date, `impossibleMessage` for one that is not on the calendar
 * (2026-02-30); the window has the shared message.
 */
export function day(formatMessage: string, impossibleMessage = formatMessage) {
  return z
    .string({ error: formatMessage })
    .regex(DAY_SHAPE, { error: formatMessage, abort: true })
    .refine(isCalendarDay, { error: impossibleMessage, abort: true })
    .refine(isDayInWindow, { error: DATE_RANGE_MESSAGE, abort: true });
}

/** A date and time with an offset, like 2026-12-02T09:30:00Z, within the window. */
export function moment(formatMessage: string) {
  return z.iso
    .datetime({ offset: true, error: formatMessage })
    .refine(isMomentInWindow, { error: DATE_RANGE_MESSAGE, abort: true, when: (payload) => payload.issues.length === 0 });
}
