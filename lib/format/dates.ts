import { steady, type Clock } from "./clock";
import type { Look } from "./look";
import { memo } from "./memo";

// Every date and time people read, in one style: "2 Dec 2026" for a day,
// "2 Dec 2026, 13:55" for a moment, "1 Nov 2026 – 31 Jan 2027" for a span
// (en-GB; other locales get their own order from Intl/CLDR). Machine columns
// (the CSV's ISO UTC, <time dateTime>) keep ISO; everything shown goes through here.
export { formatMoment, steady } from "./clock";

type Locale = Pick<Look, "locale">;

/** A calendar day ("2026-12-02") as an instant at noon UTC, formatted in UTC: the day never shifts with a zone. */
const dayInstant = (day: string) => new Date(/^\d{4}-\d{2}-\d{2}$/.test(day) ? `${day}T12:00:00Z` : day);

// The formatters below are built once per locale and options (the screens and exports format many).
function dtf(locale: string, options: Intl.DateTimeFormatOptions) {
  const f = memo("date", locale, options, () => new Intl.DateTimeFormat(locale, options));
  return { format: (d: Date) => steady(f.format(d)), formatRange: (a: Date, b: Date) => steady(f.formatRange(a, b)), formatToParts: (d: Date) => f.formatToParts(d) };
}

/** "2 Dec 2026": a calendar day. */
export function formatDay(day: string, look: Locale): string {
  return dtf(look.locale, { dateStyle: "medium", timeZone: "UTC" }).format(dayInstant(day));
}

/** "2 December 2026": a day spelled out, for sentences, warnings and mail. */
export function formatLongDay(day: string, look: Locale): string {
  return dtf(look.locale, { dateStyle: "long", timeZone: "UTC" }).format(dayInstant(day));
}

/** "2 Dec": a day on a chart's axis, where the year is in the title. */
export function formatDayMonth(day: string, look: Locale): string {
  return dtf(look.locale, { day: "numeric", month: "short", timeZone: "UTC" }).format(dayInstant(day));
}

/** "1 Nov 2026 – 31 Jan 2027", "1–30 Nov 2026": two calendar days, the shared parts once. */
export function formatDayRange(from: string, to: string, look: Locale): string {
  const a = dayInstant(from);
  const b = dayInstant(to);
  const f = dtf(look.locale, { dateStyle: "medium", timeZone: "UTC" });
  // CLDR's range pattern puts thin spaces (U+2009) round the dash; steady() makes them plain, like the other dates.
  return a.getTime() > b.getTime() ? `${f.format(a)} – ${f.format(b)}` : f.formatRange(a, b);
}


/** "2 Dec 2026": the day a moment falls on, on the group's clock. */
export function formatMomentDay(at: string | Date, look: Clock): string {
  return dtf(look.locale, { dateStyle: "medium", timeZone: look.timeZone }).format(new Date(at));
}

/** "13:55": a moment's time alone, when the day is said next to it. */
export function formatTime(at: string | Date, look: Clock): string {
  return dtf(look.locale, { timeStyle: "short", timeZone: look.timeZone }).format(new Date(at));
}

/** The calendar day ("2026-12-02") a moment falls on in a time zone: for comparing and filtering, not for showing. */
export function localDay(at: string | Date, timeZone: string): string {
  const parts = Object.fromEntries(
    dtf("en-GB", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" })
      .formatToParts(new Date(at))
      .map((p) => [p.type, p.value]),
  );
  return `${parts.year}-${parts.month}-${parts.day}`;
}

/** "3 hours ago", "1 day ago": Intl.RelativeTimeFormat, so the unit's plural is CLDR's. */
export function formatAgo(amount: number, unit: "minute" | "hour" | "day", look: Locale = { locale: "en-GB" }): string {
  return new Intl.RelativeTimeFormat(look.locale, { numeric: "always" }).format(-amount, unit);
}
