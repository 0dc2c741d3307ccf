/**
 * How the planner, unit pages and build sheet print numbers, so every screen
 * (and the tests that compare them with the API) round the same way. Built on
 * lib/format: lengths as a tape measure reads them (inches to the nearest
 * eighth, millimetres whole), and a no-break space between number and unit.
 */
import { DEFAULT_LOOK, formatInches, formatMillimetres, formatNumber as formatIn, MM_PER_INCH, NBSP, type Look } from "@/lib/format";
import type { LengthUnit } from "./grid-input";

type Locale = Pick<Look, "locale">;

export function formatNumber(value: number, maxDigits = 0, look: Locale = DEFAULT_LOOK): string {
  return formatIn(value, look, maxDigits);
}

/** A length in the plan's unit: inches to the nearest ⅛, millimetres whole. */
export function formatLength(value: number, unit: LengthUnit, look: Locale = DEFAULT_LOOK): string {
  return unit === "in" ? formatInches(value, look) : formatMillimetres(value, look);
}

/**
 * A long run of something (an adhesive bead, a seam) as it is bought and laid:
 * metres to 0.1 in a millimetre plan, feet to 0.1 in an inch plan, under a metre
 * or four feet it stays a tape-measure length.
 */
export function formatRunLength(value: number, unit: LengthUnit, look: Locale = DEFAULT_LOOK): string {
  if (unit === "mm") return value >= 1000 ? `${formatNumber(value / 1000, 1, look)}${NBSP}m` : formatMillimetres(value, look);
  return value >= 48 ? `${formatNumber(value / 12, 1, look)}${NBSP}ft` : formatInches(value, look);
}

/** An area in the plan's unit squared, whole: a tape measure's precision gives no more. */
export function formatArea(value: number, unit: LengthUnit, look: Locale = DEFAULT_LOOK): string {
  return `${formatNumber(value, 0, look)}${NBSP}${unit}²`;
}

/** A glazing's aperture: square metres for a metric plan (mm² would be seven digits no one measures); in² with m² for an inch plan. */
export function formatAperture(value: number, unit: LengthUnit, look: Locale = DEFAULT_LOOK): string {
  const m2 = formatM2(areaToM2(value, unit), look);
  return unit === "mm" ? m2 : `${formatArea(value, unit, look)} (${m2})`;
}

export function areaToM2(value: number, unit: LengthUnit): number {
  return unit === "mm" ? value / 1e6 : (value * MM_PER_INCH * MM_PER_INCH) / 1e6;
}

/** Square metres to 0.01 (a square of 10 cm). */
export function formatM2(m2: number, look: Locale = DEFAULT_LOOK): string {
  return `${formatNumber(m2, 2, look)}${NBSP}m²`;
}

export function formatPercent(share: number, look: Locale = DEFAULT_LOOK): string {
  return `${formatNumber(share * 100, 1, look)}${NBSP}%`;
}
