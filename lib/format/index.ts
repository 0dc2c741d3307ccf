// The one presentation layer: dates, numbers, counts and measures in the
// group's time zone, locale and units (a Look). Client-safe and free of
// libraries: only Intl (DateTimeFormat, NumberFormat, PluralRules).
import { formatDay, formatDayMonth, formatDayRange, formatLongDay, formatMoment, formatMomentDay, formatTime } from "./dates";
import { DEFAULT_LOOK, type Look } from "./look";
import { formatArea, formatDistance, formatLength, formatMass } from "./measures";
import { formatCount, formatNumber, formatPercent } from "./numbers";
import type { Noun } from "@/lib/plural";

export * from "./dates";
export * from "./look";
export * from "./measures";
export * from "./numbers";
export { noun, type Noun } from "@/lib/plural";

/** Every formatter bound to one group's look: `const f = formatter(look); f.day(drive.startsOn)`. */
export function formatter(look: Look = DEFAULT_LOOK) {
  return {
    look,
    day: (day: string) => formatDay(day, look),
    longDay: (day: string) => formatLongDay(day, look),
    dayMonth: (day: string) => formatDayMonth(day, look),
    dayRange: (from: string, to: string) => formatDayRange(from, to, look),
    moment: (at: string | Date) => formatMoment(at, look),
    dayOf: (at: string | Date) => formatMomentDay(at, look),
    time: (at: string | Date) => formatTime(at, look),
    number: (n: number, maxDigits = 0) => formatNumber(n, look, maxDigits),
    percent: (share: number, digits = 0) => formatPercent(share, look, digits),
    count: (n: number, word: Noun | string) => formatCount(n, word, look),
    length: (mm: number) => formatLength(mm, look),
    area: (mm2: number) => formatArea(mm2, look),
    mass: (kg: number) => formatMass(kg, look),
    distance: (km: number) => formatDistance(km, look),
  };
}

export type Formatter = ReturnType<typeof formatter>;

/** "2 Dec 2026, 08:40" in the default look: for the few places no group is known (kept for older callers). */
export function formatDateTime(value: string | Date, timeZone?: string): string {
  return formatMoment(value, { ...DEFAULT_LOOK, timeZone: timeZone ?? DEFAULT_LOOK.timeZone });
}
