// The drive's good cans per day as a series on a real time axis: every day
// from the first to the last appears at its own place, days without entries
// as zero, so a quiet week shows as a gap rather than vanishing.

import { formatDayMonth } from "@/lib/format/dates";
import { DEFAULT_LOOK, type Look } from "@/lib/format/look";

export interface DailyPoint {
  /** YYYY-MM-DD */
  date: string;
  /** Midnight UTC of that day in ms: the chart's numeric x value. */
  t: number;
  goodCans: number;
  cumulative: number;
}

const DAY_MS = 86_400_000;
const dayMs = (date: string) => Date.parse(`${date}T00:00:00Z`);

export function dailySeries(days: { date: string; goodCans: number }[], from: string, to: string): DailyPoint[] {
  const byDay = new Map(days.map((d) => [d.date, d.goodCans]));
  const last = days.reduce((m, d) => (d.date > m ? d.date : m), to);
  const out: DailyPoint[] = [];
  let running = 0;
  for (let t = dayMs(from); t <= dayMs(last); t += DAY_MS) {
    const date = new Date(t).toISOString().slice(0, 10);
    const goodCans = byDay.get(date) ?? 0;
    running += goodCans;
    out.push({ date, t, goodCans, cumulative: running });
  }
  return out;
}

/** "3 Nov" for a chart tick (the axis spans one drive; the tooltip gives the year), in the group's locale. */
export const dayTick = (t: number, look: Pick<Look, "locale"> = DEFAULT_LOOK) => formatDayMonth(new Date(t).toISOString().slice(0, 10), look);
