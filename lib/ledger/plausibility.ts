/**
 * What is unusual enough to ask about before it enters the ledger. Nothing
 * here refuses: an unusual entry is answered with a question (409 with
 * `confirm: "implausible"`), and the same entry sent again with
 * `confirmUnusual: true` is recorded. Real hauls do surprise — a bin emptied
 * after a street party, a bag of flattened cans — so the person who was there
 * decides; the server only makes sure they meant it.
 */
import { conflict } from "@/lib/api/errors";
import { DEFAULT_CANS_PER_BAG } from "./estimate";
import { countOf } from "@/lib/plural";

/**
 * A sort counting more than 3× its hauls' estimate, or under a third of it,
 * is asked about. Common practice, no published source: the bag estimate is
 * rough (bags arrive part-filled and mixed, see DEFAULT_CANS_PER_BAG), so
 * counts of half or double the estimate are ordinary; beyond a factor of 3
 * a typo (an extra zero) or the wrong haul ticked is far more likely.
 */
export const SORT_ESTIMATE_FACTOR = 3;

/**
 * A difference smaller than one bag's worth of cans is never asked about,
 * however large the ratio: 5 cans counted from a 1-can estimate is a small
 * haul, not a mistake. Same figure as DEFAULT_CANS_PER_BAG (common practice,
 * no published source).
 */
export const SMALL_DIFFERENCE_CANS = DEFAULT_CANS_PER_BAG;

/**
 * A haul of more than 3× its drop point's bin capacity (drop_points.capacity_bags)
 * is asked about. Common practice, no published source: a bin left unemptied
 * overflows into bags stacked beside it, so twice its size happens; three
 * times over suggests bags were typed for cans, or the wrong drop point.
 */
export const BIN_OVERFILL_FACTOR = 3;

/**
 * A weighed haul whose cans per bag (weight → cans at the group's calibrated
 * cans per kg, divided by bags) is more than 4× or under a quarter of the
 * group's calibrated cans per bag is asked about. Common practice, no published source. Wider than for sorts
 * because the uncalibrated cans per bag is deliberately low (a packed bag
 * holds well over twice DEFAULT_CANS_PER_BAG), so a full bag weighed is
 * already 2–3× the bag figure.
 */
export const CALIBRATED_RANGE_FACTOR = 4;

export type UnusualCheck = "sortVsEstimate" | "binCapacity" | "calibratedRange";

export interface Unusual {
  check: UnusualCheck;
  /** The question to ask, e.g. "That is 1,000,000 cans from 1 bag (about 60 expected). Is that right?" */
  message: string;
  value: number;
  expected: number;
  factor: number;
}

const n = (x: number) => Math.round(x).toLocaleString("en-GB");
// Counts with their noun through Intl.PluralRules (lib/plural.ts), the number rounded as shown.
const plural = (x: number, one: string) => countOf(Math.round(x), one, n);

/** Outside [expected ÷ factor, expected × factor], and by more than a bag's worth. */
function farFrom(value: number, expected: number, factor: number): boolean {
  if (Math.abs(value - expected) <= SMALL_DIFFERENCE_CANS) return false;
  return value > expected * factor || value * factor < expected;
}

/** A sort of `counted` cans (good + rejected) from hauls estimated at `estimated` cans in `bags` bags. */
export function checkSort(s: { counted: number; estimated: number; bags: number; hauls: number }): Unusual[] {
  if (!farFrom(s.counted, s.estimated, SORT_ESTIMATE_FACTOR)) return [];
  const from = s.bags > 0 ? plural(s.bags, "bag") : plural(s.hauls, "haul");
  return [
    {
      check: "sortVsEstimate",
      message: `That is ${plural(s.counted, "can")} from ${from} (about ${n(s.estimated)} expected). Is that right?`,
      value: s.counted,
      expected: s.estimated,
      factor: SORT_ESTIMATE_FACTOR,
    },
  ];
}

/**
 * A haul of `bags` bags at a drop point whose bin holds `capacityBags`; when
 * weighed, `cansByWeight` (the weight estimate) is compared with
 * `bags × cansPerBag` (the group's calibrated cans per bag).
 */
export function checkHaul(h: { bags: number; capacityBags: number; cansByWeight: number | null; cansPerBag: number }): Unusual[] {
  const found: Unusual[] = [];
  if (h.capacityBags > 0 && h.bags > h.capacityBags * BIN_OVERFILL_FACTOR) {
    found.push({
      check: "binCapacity",
      message: `That is ${plural(h.bags, "bag")} from a bin that holds ${plural(h.capacityBags, "bag")}. Is that right?`,
      value: h.bags,
      expected: h.capacityBags,
      factor: BIN_OVERFILL_FACTOR,
    });
  }
  if (h.cansByWeight !== null && h.bags > 0) {
    const expected = h.bags * h.cansPerBag;
    if (farFrom(h.cansByWeight, expected, CALIBRATED_RANGE_FACTOR)) {
      found.push({
        check: "calibratedRange",
        message: `That weight is about ${plural(h.cansByWeight, "can")} in ${plural(h.bags, "bag")} (about ${n(expected)} expected). Is that right?`,
        value: h.cansByWeight,
        expected: Math.round(expected),
        factor: CALIBRATED_RANGE_FACTOR,
      });
    }
  }
  return found;
}

/** The body of the 409 the forms turn into a Yes/No question. */
export function unusualDetails(found: Unusual[]) {
  return { confirm: "implausible" as const, confirmField: "confirmUnusual" as const, unusual: found };
}

/** Throws the 409 question unless the request said it is right (`confirmUnusual: true`). */
export function askUnlessConfirmed(found: Unusual[], confirmed: boolean | undefined): void {
  if (found.length === 0 || confirmed === true) return;
  throw conflict(found.map((f) => f.message).join(" "), unusualDetails(found));
}
