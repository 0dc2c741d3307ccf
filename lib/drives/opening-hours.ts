import { z } from "zod";

/**
 * Structured opening hours of a drop point, enough to answer "open on that day?".
 * Days use ISO 8601 weekday numbering: 1 = Monday … 7 = Sunday.
 * The free-text `hours` field stays for notes ("ring the side bell").
 */
const TIME = /^([01]\d|2[0-3]):[0-5]\d$/;

export const openingSpanSchema = z
  .object({
    days: z.array(z.number().int().min(1).max(7)).min(1, "Pick at least one day.").max(7),
    opens: z.string().regex(TIME, "Use a time like 09:00."),
    closes: z.string().regex(TIME, "Use a time like 17:30."),
  })
  .refine((s) => s.opens < s.closes, { message: "The closing time must be after the opening time.", path: ["closes"] });

export const openingHoursSchema = z.array(openingSpanSchema).max(14, "Keep it to 14 time spans or fewer.");

export type OpeningSpan = z.infer<typeof openingSpanSchema>;
export type OpeningHours = z.infer<typeof openingHoursSchema>;

export const ISO_WEEKDAY_LABELS: Record<number, string> = {
  1: "Monday", 2: "Tuesday", 3: "Wednesday", 4: "Thursday", 5: "Friday", 6: "Saturday", 7: "Sunday",
};

/** ISO 8601 weekday (1 = Monday … 7 = Sunday) of a calendar date "YYYY-MM-DD". */
export function isoWeekday(date: string): number {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  if (!m) throw new Error(`Not a calendar date: ${date}`);
  const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
  if (d.getUTCDate() !== Number(m[3])) throw new Error(`Not a calendar date: ${date}`);
  const js = d.getUTCDay(); // 0 = Sunday
  return js === 0 ? 7 : js;
}

/**
 * Is the drop point open at some time on that calendar date?
 * `null` when no structured hours are recorded: we do not know, so we do not warn.
 * An empty list of spans also means "not recorded".
 */
export function isOpenOnDate(hours: OpeningHours | null | undefined, date: string): boolean | null {
  if (!hours || hours.length === 0) return null;
  const day = isoWeekday(date);
  return hours.some((s) => s.days.includes(day));
}

/** The calendar date "YYYY-MM-DD" of an instant in a time zone (IANA name), via Intl. */
export function calendarDateIn(instant: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).formatToParts(instant);
  const get = (t: string) => parts.find((p) => p.type === t)?.value ?? "";
  return `${get("year")}-${get("month")}-${get("day")}`;
}

/** A haul logged on a day other than the run's date, in the group's time zone: warn (never block). */
export function haulDayMismatch(runDate: string, loggedAt: Date, timeZone: string): boolean {
  return calendarDateIn(loggedAt, timeZone) !== runDate;
}

export const ISO_WEEKDAY_SHORT: Record<number, string> = { 1: "Mon", 2: "Tue", 3: "Wed", 4: "Thu", 5: "Fri", 6: "Sat", 7: "Sun" };

/** "Mon–Fri, Sun" for ISO weekdays: runs of three or more consecutive days are joined with a dash. */
export function describeDays(days: readonly number[]): string {
  const sorted = [...new Set(days)].sort((a, b) => a - b);
  const parts: string[] = [];
  for (let i = 0; i < sorted.length; ) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j]! + 1) j++;
    const [from, to] = [ISO_WEEKDAY_SHORT[sorted[i]!], ISO_WEEKDAY_SHORT[sorted[j]!]];
    if (j - i >= 2) parts.push(`${from}–${to}`);
    else for (let k = i; k <= j; k++) parts.push(ISO_WEEKDAY_SHORT[sorted[k]!]!);
    i = j + 1;
  }
  return parts.join(", ");
}

/** "Mon–Fri 09:00–17:00; Sat 10:00–12:00", or "" when no hours are recorded. */
export function describeOpeningHours(hours: OpeningHours | null | undefined): string {
  return (hours ?? []).map((s) => `${describeDays(s.days)} ${s.opens}–${s.closes}`).join("; ");
}

/** The spans as the drop-point form sends them (a hidden field holding JSON); empty or unreadable text is "none recorded". */
export const openingHoursField = z.preprocess((raw) => {
  if (typeof raw !== "string") return raw;
  if (raw.trim() === "") return [];
  try {
    return JSON.parse(raw);
  } catch {
    return raw; // not JSON: the array schema refuses it with its own message
  }
}, openingHoursSchema);
