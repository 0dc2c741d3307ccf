import type { Look } from "./look";

// The core of lib/format/dates.ts, kept as small as it can be: the public drive
// page's client code (its JavaScript budget is tight) takes only this file.
// One style: "2 Dec 2026, 13:55" for a moment.

export type Clock = Pick<Look, "locale" | "timeZone">;

/**
 * Server and browser render the same text: ICU builds differ in small ways (CLDR 38+ has en-GB
 * "Sept", older data "Sep"; some put U+202F before "PM" and U+2009 round a range's dash), and a
 * page whose server and browser text disagree fails to hydrate. One spelling for each.
 */
export const steady = (text: string) => text.replace(/\bSept\b/g, "Sep").replace(/\u202f/g, "\u00a0").replace(/\u2009/g, " ");

/** "2 Dec 2026, 13:55": a moment on the group's clock. */
export function formatMoment(at: string | Date, look: Clock): string {
  return steady(new Date(at).toLocaleString(look.locale, { dateStyle: "medium", timeStyle: "short", timeZone: look.timeZone }));
}
