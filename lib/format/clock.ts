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

// Building an Intl formatter is the costly part (≈50 ms on a slow phone the first time); one per clock.
const formatters = new Map<string, Intl.DateTimeFormat>();

/** "2 Dec 2026, 13:55": a moment on the group's clock. */
export function formatMoment(at: string | Date, look: Clock): string {
  const key = `${look.locale}|${look.timeZone}`;
  let f = formatters.get(key);
  if (!f) formatters.set(key, (f = new Intl.DateTimeFormat(look.locale, { dateStyle: "medium", timeStyle: "short", timeZone: look.timeZone })));
  return steady(f.format(new Date(at)));
}
