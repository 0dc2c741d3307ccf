import type { Look } from "./look";
import { memo } from "./memo";

// The core of lib/format/dates.ts: the Intl date formatter, a calendar day and a
// moment in one style, and "3 hours ago". Apart so the public drive page's
// client code (its JavaScript budget is tight) takes only this.

/**
 * Server and browser render the same text: ICU builds differ in small ways (CLDR 38+ has en-GB
 * "Sept", older data "Sep"; some put U+202F before "PM" and U+2009 round a range's dash), and a
 * page whose server and browser text disagree fails to hydrate. One spelling for each.
 */
export const steady = (text: string) => text.replace(/\bSept\b/g, "Sep").replace(/\u202f/g, "\u00a0").replace(/\u2009/g, " ");

export function dtf(locale: string, options: Intl.DateTimeFormatOptions) {
  const f = memo("date", locale, options, () => new Intl.DateTimeFormat(locale, options));
  return { format: (d: Date) => steady(f.format(d)), formatRange: (a: Date, b: Date) => steady(f.formatRange(a, b)), formatToParts: (d: Date) => f.formatToParts(d) };
}

const DAY_SHAPE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** A calendar day ("2026-12-02") as an instant at noon UTC, formatted in UTC: the day never shifts with a zone. */
export function dayInstant(day: string): Date {
  const m = DAY_SHAPE.exec(day);
  if (!m) return new Date(day);
  return new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]), 12));
}

export type Locale = Pick<Look, "locale">;
export type Clock = Pick<Look, "locale" | "timeZone">;

/** "2 Dec 2026": a calendar day. */
export function formatDay(day: string, look: Locale): string {
  return dtf(look.locale, { dateStyle: "medium", timeZone: "UTC" }).format(dayInstant(day));
}

/** "2 Dec 2026, 13:55": a moment on the group's clock. */
export function formatMoment(at: string | Date, look: Clock): string {
  return dtf(look.locale, { dateStyle: "medium", timeStyle: "short", timeZone: look.timeZone }).format(new Date(at));
}

/** "3 hours ago", "1 day ago": Intl.RelativeTimeFormat, so the unit's plural is CLDR's. */
export function formatAgo(amount: number, unit: "minute" | "hour" | "day", look: Pick<Look, "locale"> = { locale: "en-GB" }): string {
  return memo("ago", look.locale, {}, () => new Intl.RelativeTimeFormat(look.locale, { numeric: "always" })).format(-amount, unit);
}
