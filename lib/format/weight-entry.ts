import { NUMBER_SPECS, type NumberSpec } from "@/lib/forms/number-input";
import { noun } from "@/lib/plural";
import type { Units } from "./look";
import { KG_PER_POUND } from "./measures";

/**
 * How a weight is typed in the group's units: the box's unit word and spec, and
 * the conversion to the kilograms the API takes (1 lb = 0.45359237 kg exactly).
 * The API and the ledger stay in kg; only the box speaks pounds.
 */
export interface WeightEntry {
  unit: "kg" | "lb";
  spec: NumberSpec;
  toKg: (typed: number | null) => number | null;
  /** A stored weight in kg as the box shows it (pounds to the hundredth in an imperial group). */
  fromKg: (kg: number) => number;
}

const MAX_KG = NUMBER_SPECS.haulWeightKg.max ?? 5_000;

export function weightEntry(units: Units): WeightEntry {
  if (units === "imperial") {
    return {
      unit: "lb",
      spec: { noun: noun("lb", "lb"), decimal: true, min: 0, max: Math.floor(MAX_KG / KG_PER_POUND) },
      // To the gram: finer than any scale a volunteer carries, and what the kg box takes.
      toKg: (typed) => (typed === null ? null : Math.round(typed * KG_PER_POUND * 1000) / 1000),
      fromKg: (kg) => Math.round((kg / KG_PER_POUND) * 100) / 100,
    };
  }
  return { unit: "kg", spec: NUMBER_SPECS.haulWeightKg, toKg: (typed) => typed, fromKg: (kg) => kg };
}
