/**
 * Computation 3: how many cans a haul probably holds, before anyone counts
 * them. Always an estimate; a sort later replaces it with counted cans, and
 * those counts feed back here as the group's own calibration.
 */

/** Exact by definition of the international avoirdupois pound (NIST SP 811). */
export const GRAMS_PER_POUND = 453.59237;

/**
 * 34 empty cans per pound: figure published by the aluminium can industry's
 * trade associations (2009). Keeping the published ratio rather than a
 * rounded mass makes 1 lb come out at exactly 34 cans.
 */
export const CANS_PER_POUND = 34;

/** ≈ 13.34 g per can. */
export const DEFAULT_GRAMS_PER_CAN = GRAMS_PER_POUND / CANS_PER_POUND;

/**
 * Cans in one standard 30-gallon bag as it arrives from a drop point.
 * Common practice, no published source. A bag packed full of uncrushed cans
 * holds well over twice this, but donated bags come part-filled and mixed,
 * so a conservative figure is used and calibration corrects it per group.
 */
export const DEFAULT_CANS_PER_BAG = 60;

/**
 * How many counted hauls the default is "worth" when blending. With k = 3,
 * the first counted haul moves the ratio a quarter of the way to what was
 * counted, and after 27 hauls the group's own ratio carries 90 % — quick
 * enough to matter within one drive, slow enough that one odd haul (a bag
 * of wet cans, a half-empty bin) cannot swing every later estimate.
 */
export const DEFAULT_PRIOR_HAULS = 3;

export interface HaulMeasure {
  bags: number;
  /** Net mass in kg; null or absent when the haul was not weighed. */
  weightKg?: number | null;
}

/**
 * One sort's worth of counted evidence. A sort may close several hauls, so
 * the evidence is the sort, not the haul: `counted` is every can the sort
 * counted (good plus rejected), because the estimate is of cans hauled, not
 * of cans that pass. `weightKg` is null unless every haul in it was weighed —
 * otherwise cans from unweighed bags would inflate cans per kg.
 */
export interface CountedBatch {
  hauls: number;
  counted: number;
  bags: number;
  weightKg: number | null;
}

/** Running sums for the ratio estimators Σcounted ÷ Σkg and Σcounted ÷ Σbags. */
export interface Calibration {
  weight: { hauls: number; cans: number; kg: number };
  bags: { hauls: number; cans: number; bags: number };
}

export interface EstimateOptions {
  gramsPerCan?: number;
  cansPerBag?: number;
  priorHauls?: number;
  /** Mass of one empty bag, subtracted when the scale read bags and all. Default 0 (weight already net). */
  bagTareKg?: number;
}

export interface CanEstimate {
  /** Whole cans; an estimate, never a count. */
  cans: number;
  method: "weight" | "bags";
  /** Cans per kg (weight) or per bag (bags) actually applied, after blending. */
  perUnit: number;
  basis: { countedHauls: number; calibrated: boolean };
}

export const EMPTY_CALIBRATION: Calibration = {
  weight: { hauls: 0, cans: 0, kg: 0 },
  bags: { hauls: 0, cans: 0, bags: 0 },
};

/** Folds sorts into the sums; callers that keep running totals can skip this. */
export function calibrationFrom(batches: readonly CountedBatch[]): Calibration {
  const cal: Calibration = { weight: { hauls: 0, cans: 0, kg: 0 }, bags: { hauls: 0, cans: 0, bags: 0 } };
  for (const b of batches) {
    if (b.weightKg != null && b.weightKg > 0) {
      cal.weight.hauls += b.hauls;
      cal.weight.cans += b.counted;
      cal.weight.kg += b.weightKg;
    }
    if (b.bags > 0) {
      cal.bags.hauls += b.hauls;
      cal.bags.cans += b.counted;
      cal.bags.bags += b.bags;
    }
  }
  return cal;
}

/**
 * Shrinks the group's observed ratio toward the default:
 *   perUnit = (k · prior + n · observed) / (k + n)
 * where n is the number of counted hauls behind `observed`.
 */
export function blendedRatio(prior: number, cans: number, units: number, hauls: number, k: number): number {
  if (hauls <= 0 || units <= 0) return prior;
  const observed = cans / units;
  return (k * prior + hauls * observed) / (k + hauls);
}

/**
 * A weighed haul is estimated by mass (bags vary far more than cans do);
 * 0 kg is a real reading and gives 0 cans. Unweighed hauls use bags.
 */
export function estimateHaulCans(
  haul: HaulMeasure,
  calibration: Calibration = EMPTY_CALIBRATION,
  options: EstimateOptions = {},
): CanEstimate {
  const gramsPerCan = options.gramsPerCan ?? DEFAULT_GRAMS_PER_CAN;
  const cansPerBag = options.cansPerBag ?? DEFAULT_CANS_PER_BAG;
  const k = options.priorHauls ?? DEFAULT_PRIOR_HAULS;
  const tare = options.bagTareKg ?? 0;
  requireNonNegative("bags", haul.bags);
  requireNonNegative("priorHauls", k);
  requireNonNegative("bagTareKg", tare);
  if (!(gramsPerCan > 0) || !(cansPerBag > 0)) throw new RangeError("gramsPerCan and cansPerBag must be positive");

  if (haul.weightKg != null) {
    requireNonNegative("weightKg", haul.weightKg);
    const netKg = Math.max(0, haul.weightKg - tare * haul.bags);
    const { hauls, cans, kg } = calibration.weight;
    const perKg = blendedRatio(1000 / gramsPerCan, cans, kg, hauls, k);
    return estimate(netKg * perKg, "weight", perKg, kg > 0 ? hauls : 0);
  }

  const { hauls, cans, bags } = calibration.bags;
  const perBag = blendedRatio(cansPerBag, cans, bags, hauls, k);
  return estimate(haul.bags * perBag, "bags", perBag, bags > 0 ? hauls : 0);
}

function estimate(raw: number, method: CanEstimate["method"], perUnit: number, countedHauls: number): CanEstimate {
  return {
    cans: Math.round(raw),
    method,
    perUnit,
    basis: { countedHauls, calibrated: countedHauls > 0 },
  };
}

function requireNonNegative(name: string, value: number): void {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a finite number ≥ 0`);
}
