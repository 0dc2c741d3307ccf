/**
 * Computation 2: a drive's target and how far along it is. Only counted good
 * cans make progress; hauled-but-unsorted cans are shown as an estimate
 * beside it, scaled by the share of counted cans that turned out usable.
 */

export const DEFAULT_SPARE_PERCENT = 5;

/**
 * Share of hauled cans assumed usable before the drive's first sort.
 * An assumption with no published source: public bags hold crushed, dented
 * and slim cans, so assuming every can is usable would overstate progress.
 * Replaced by the observed yield as soon as anything is sorted.
 */
export const DEFAULT_YIELD = 0.8;

export const DEFAULT_PACE_WINDOW_DAYS = 14;

export interface DriveTarget {
  /** Cans the heater units need, before the spare. */
  heaterCans: number;
  /** Spare for cans spoiled while cutting and punching, rounded up to whole cans. */
  spare: number;
  /** heaterCans + spare. */
  cans: number;
  heaters: number;
}

/**
 * Counted good cans in every stage from `good` onward. `claimed` is the
 * balance of a claimed *stage*; a ledger that tracks claims as a reservation
 * on top of good..punched must pass 0 here or the cans count twice.
 */
export interface GoodStageBalances {
  good: number;
  washed: number;
  opened: number;
  punched: number;
  claimed: number;
  builtIn: number;
}

export interface DailyTotal {
  /** YYYY-MM-DD, in the group's calendar. */
  date: string;
  /** Good cans counted that day, net of reversals (may be negative). */
  goodCans: number;
}

export interface DriveProgressInput {
  /** Cans each heater unit counted against the drive needs, in the order they get cans. */
  unitCans: readonly number[];
  stages: GoodStageBalances;
  /** Every can ever rejected in a sort, including those since taken to recycling. */
  rejectedCans: number;
  /** Balance of the hauled stage: estimated cans not yet closed by a sort. */
  hauledEstimate: number;
  daily: readonly DailyTotal[];
  /** YYYY-MM-DD; passed in so the function stays pure. */
  today: string;
  /** YYYY-MM-DD; a drive younger than the window is not charged for days before it began. */
  startsOn?: string;
  /** YYYY-MM-DD, the drive's last day; after it no finish is promised. */
  endsOn?: string;
  sparePercent?: number;
  defaultYield?: number;
  windowDays?: number;
}

export interface DriveProgress {
  target: DriveTarget;
  goodCans: number;
  /** good ÷ (good + rejected), or the default when nothing is sorted yet. */
  yield: number;
  yieldSource: "observed" | "default";
  /** round(hauledEstimate × yield): likely good cans still in unsorted bags. */
  estimatedUnsorted: number;
  /**
   * max(0, target − goodCans). The unsorted estimate is deliberately left
   * out: a drive that stopped collecting on a guess could end short, while
   * collecting a few bags too many costs little.
   */
  remaining: number;
  heatersCovered: { covered: number; total: number };
  pace: { cansPerDay: number; windowDays: number };
  /** YYYY-MM-DD when the pace says the target will be met; null whenever `finish` is not "expected". */
  expectedFinish: string | null;
  finish: DriveFinish;
}

/**
 * What can honestly be said about when the drive is done. A date is only
 * promised from a pace, for a drive that has a target, is still running and
 * has not met it.
 */
export type DriveFinish =
  | { kind: "noTarget" }
  | { kind: "reached" }
  | { kind: "ended"; endsOn: string }
  | { kind: "notStarted"; startsOn: string }
  | { kind: "noPace"; windowDays: number }
  | { kind: "expected"; date: string; afterEnd: boolean; endsOn?: string };

export function driveTarget(unitCans: readonly number[], sparePercent = DEFAULT_SPARE_PERCENT): DriveTarget {
  const heaterCans = unitCans.reduce((sum, c) => sum + nonNegative("unit cans", c), 0);
  nonNegative("sparePercent", sparePercent);
  // Percent × cans / 100 keeps whole-number inputs exact; the small
  // tolerance stops float noise like 15.000000000000002 from adding a can.
  const spare = Math.max(0, Math.ceil((heaterCans * sparePercent) / 100 - 1e-9)); // max: ⌈−ε⌉ is −0
  return { heaterCans, spare, cans: heaterCans + spare, heaters: unitCans.length };
}

export function countGoodCans(s: GoodStageBalances): number {
  return s.good + s.washed + s.opened + s.punched + s.claimed + s.builtIn;
}

/** Yield from counted cans, or the stated default before any sort. */
export function observedYield(
  goodCans: number,
  rejectedCans: number,
  defaultYield = DEFAULT_YIELD,
): { value: number; source: "observed" | "default" } {
  const sorted = goodCans + rejectedCans;
  if (sorted <= 0) return { value: defaultYield, source: "default" };
  return { value: goodCans / sorted, source: "observed" };
}

/**
 * Units take cans in the given order, so a unit counts as covered only if
 * it and every unit before it are — the screen can then say which heaters
 * are ready rather than a count that skips around.
 */
export function heatersCovered(unitCans: readonly number[], goodCans: number): number {
  let left = goodCans;
  let covered = 0;
  for (const need of unitCans) {
    if (need > left) break;
    left -= need;
    covered++;
  }
  return covered;
}

/** Good cans a day over the last `windowDays` days up to and including today. */
export function paceCansPerDay(
  daily: readonly DailyTotal[],
  today: string,
  windowDays = DEFAULT_PACE_WINDOW_DAYS,
  startsOn?: string,
): { cansPerDay: number; windowDays: number } {
  const end = dayNumber(today);
  let days = Math.floor(windowDays);
  if (startsOn !== undefined) days = Math.min(days, end - dayNumber(startsOn) + 1);
  if (days <= 0) return { cansPerDay: 0, windowDays: 0 };
  let sum = 0;
  for (const d of daily) {
    const n = dayNumber(d.date);
    if (n > end - days && n <= end) sum += d.goodCans;
  }
  return { cansPerDay: Math.max(0, sum / days), windowDays: days };
}

export function driveProgress(input: DriveProgressInput): DriveProgress {
  const target = driveTarget(input.unitCans, input.sparePercent);
  const goodCans = countGoodCans(input.stages);
  const y = observedYield(goodCans, input.rejectedCans, input.defaultYield);
  const estimatedUnsorted = Math.round(Math.max(0, input.hauledEstimate) * y.value);
  const remaining = Math.max(0, target.cans - goodCans);
  const pace = paceCansPerDay(input.daily, input.today, input.windowDays, input.startsOn);
  const finish = driveFinish(input, target, remaining, pace);
  const expectedFinish = finish.kind === "expected" ? finish.date : null;
  return {
    target,
    goodCans,
    yield: y.value,
    yieldSource: y.source,
    estimatedUnsorted,
    remaining,
    heatersCovered: { covered: heatersCovered(input.unitCans, goodCans), total: input.unitCans.length },
    pace,
    expectedFinish,
    finish,
  };
}

function driveFinish(input: DriveProgressInput, target: DriveTarget, remaining: number, pace: { cansPerDay: number; windowDays: number }): DriveFinish {
  if (target.heaters === 0 || target.cans === 0) return { kind: "noTarget" };
  if (remaining === 0) return { kind: "reached" };
  if (input.endsOn !== undefined && dayNumber(input.today) > dayNumber(input.endsOn)) return { kind: "ended", endsOn: input.endsOn };
  if (input.startsOn !== undefined && dayNumber(input.today) < dayNumber(input.startsOn)) return { kind: "notStarted", startsOn: input.startsOn };
  if (pace.cansPerDay <= 0) return { kind: "noPace", windowDays: input.windowDays ?? DEFAULT_PACE_WINDOW_DAYS };
  const date = addDays(input.today, Math.ceil(remaining / pace.cansPerDay));
  const afterEnd = input.endsOn !== undefined && dayNumber(date) > dayNumber(input.endsOn);
  return { kind: "expected", date, afterEnd, ...(input.endsOn !== undefined ? { endsOn: input.endsOn } : {}) };
}

// Calendar days as UTC day numbers: no time zone or daylight-saving shift
// can make a day 23 or 25 hours long here.
function dayNumber(iso: string): number {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(iso);
  if (!m) throw new RangeError(`Expected a YYYY-MM-DD date, got "${iso}"`);
  return Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])) / 86_400_000;
}

export function addDays(iso: string, days: number): string {
  return new Date((dayNumber(iso) + days) * 86_400_000).toISOString().slice(0, 10);
}

function nonNegative(name: string, value: number): number {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a finite number ≥ 0`);
  return value;
}
