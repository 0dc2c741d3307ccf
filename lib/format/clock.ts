import type { Look } from "./look";

// The core of lib/format/dates.ts, kept as small as it can be: the public drive
// page's client code (its JavaScript budget is tight) takes only this file.
// One style: "2 Dec 2026" for a day, "2 Dec 2026, 13:55" for a moment.

export type Locale = Pick<Look, "locale">;
export type Clock = Pick<Look, "locale" | "timeZone">;

/**
 * Server and browser render the same text: ICU builds differ in small ways (CLDR 38+ has en-GB
 * "Sept", older data "Sep"; some put U+202F before "PM" and U+2009 round a range's dash), and a
 * page whose server and browser text disagree fails to hydrate. One spelling for each.
 */
export const steady = (text: string) => text.replace(/\bSept\b/g, "Sep").replace(/\u202f/g, "\u00a0").replace(/\u2009/g, " ");

/** A calendar day ("2026-12-02") as an instant at noon UTC, formatted in UTC: the day never shifts with a zone. */
export const dayInstant = (day: string) => new Date(/^\d{4}-\d{2}-\d{2}$/.test(day) ? `${day}T12:00:00Z` : day);

/** "2 Dec 2026": a calendar day. */
export function formatDay(day: string, look: Locale): string {
  return steady(dayInstant(day).toLocaleDateString(look.locale, { dateStyle: "medium", timeZone: "UTC" }));
}

/** "2 Dec 2026, 13:55": a moment on the group's clock. */
export function formatMoment(at: string | Date, look: Clock): string {
  return steady(new Date(at).toLocaleString(look.locale, { dateStyle: "medium", timeStyle: "short", timeZone: look.timeZone }));
}

/** "3 hours ago", "1 day ago": Intl.RelativeTimeFormat, so the unit's plural is CLDR's. */
export function formatAgo(amount: number, unit: "minute" | "hour" | "day", look: Locale = { locale: "en-GB" }): string {
  return new Intl.RelativeTimeFormat(look.locale, { numeric: "always" }).format(-amount, unit);
}
