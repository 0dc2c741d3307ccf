import type { Look, Units } from "./look";
import { formatNumber } from "./numbers";

// Lengths, areas, masses and distances rounded to what a tape measure, a scale
// or a map shows, in the group's units. The number and its unit are joined by
// a no-break space (U+00A0), so "1.06 m²" never wraps between the two.

/** Exact by definition: the international yard and pound agreement (1959); NIST SP 811, appendix B. */
export const MM_PER_INCH = 25.4;
export const KG_PER_POUND = 0.45359237;
export const KM_PER_MILE = 1.609344;
export const METRES_PER_YARD = 0.9144;

export const NBSP = "\u00a0";

type Shown = Pick<Look, "locale" | "units">;

const withUnit = (value: string, unit: string) => `${value}${NBSP}${unit}`;

const EIGHTHS = ["", "⅛", "¼", "⅜", "½", "⅝", "¾", "⅞"];

/** Inches to the nearest eighth, as a tape measure reads: 45.87 → { whole: 45, eighths: 7 }. */
export function toEighths(inches: number): { negative: boolean; whole: number; eighths: number } {
  const total = Math.round(Math.abs(inches) * 8);
  return { negative: inches < 0 && total > 0, whole: Math.floor(total / 8), eighths: total % 8 };
}

/** "45⅞ in", "⅜ in", "1,167 in": inches to the nearest eighth. */
export function formatInches(inches: number, look: Pick<Look, "locale">): string {
  const { negative, whole, eighths } = toEighths(inches);
  const number = whole === 0 && eighths > 0 ? EIGHTHS[eighths] : `${formatNumber(whole, look)}${EIGHTHS[eighths]}`;
  return withUnit(`${negative ? "−" : ""}${number}`, "in");
}

/** "1,167 mm": millimetres, whole. */
export function formatMillimetres(mm: number, look: Pick<Look, "locale">): string {
  return withUnit(formatNumber(Math.round(mm), look), "mm");
}

/** A length held in millimetres, shown in the group's units. */
export function formatLength(mm: number, look: Shown): string {
  return look.units === "imperial" ? formatInches(mm / MM_PER_INCH, look) : formatMillimetres(mm, look);
}

/** An area held in square millimetres: m² to 0.01, or ft² to 0.1. */
export function formatArea(mm2: number, look: Shown): string {
  if (look.units === "imperial") return withUnit(formatNumber(mm2 / (MM_PER_INCH * 12) ** 2, look, 1), "ft²");
  return withUnit(formatNumber(mm2 / 1e6, look, 2), "m²");
}

/** A mass held in kilograms: kg or lb to 0.1, as a bathroom or hanging scale shows. */
export function formatMass(kg: number, look: Shown): string {
  if (look.units === "imperial") return withUnit(formatNumber(kg / KG_PER_POUND, look, 1), "lb");
  return withUnit(formatNumber(kg, look, 1), "kg");
}

/** A distance held in kilometres: "850 m" / "2.4 km", or "90 yd" / "1.5 mi". */
export function formatDistance(km: number, look: Shown): string {
  if (look.units === "imperial") {
    const miles = km / KM_PER_MILE;
    if (miles < 0.1) return withUnit(formatNumber(Math.round((km * 1000) / METRES_PER_YARD / 10) * 10, look), "yd");
    return withUnit(formatNumber(miles, look, 1), "mi");
  }
  if (km < 1) return withUnit(formatNumber(Math.round(km * 100) * 10, look), "m");
  return withUnit(formatNumber(km, look, 1), "km");
}

/** The unit a typed mass is asked in. */
export const massUnit = (units: Units) => (units === "imperial" ? "lb" : "kg");

/** The planner's length unit for the group's units: inches for imperial, millimetres for metric. */
export const lengthUnitOf = (units: Units): "in" | "mm" => (units === "imperial" ? "in" : "mm");
