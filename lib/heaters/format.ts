/**
 * How the planner, unit pages and build sheet print numbers, so every screen
 * (and the tests that compare them with the API) round the same way.
 */
import type { LengthUnit } from "./schemas";

export function formatNumber(value: number, maxDigits = 0): string {
  return value.toLocaleString("en-GB", { maximumFractionDigits: maxDigits, minimumFractionDigits: 0 });
}

/** A length in the plan's unit: inches to 0.1, millimetres whole. */
export function formatLength(value: number, unit: LengthUnit): string {
  return `${formatNumber(value, unit === "in" ? 2 : 0)} ${unit}`;
}

/** An area in the plan's unit squared: in² to 0.1, mm² whole. */
export function formatArea(value: number, unit: LengthUnit): string {
  return `${formatNumber(value, unit === "in" ? 1 : 0)} ${unit}²`;
}

export function areaToM2(value: number, unit: LengthUnit): number {
  return unit === "mm" ? value / 1e6 : (value * 25.4 * 25.4) / 1e6;
}

export function formatM2(m2: number): string {
  return `${formatNumber(m2, 3)} m²`;
}

export function formatPercent(share: number): string {
  return `${formatNumber(share * 100, 1)} %`;
}
