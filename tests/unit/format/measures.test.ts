import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import { formatArea, formatDistance, formatInches, formatLength, formatMass, formatMillimetres, KG_PER_POUND, KM_PER_MILE, MM_PER_INCH, NBSP, toEighths } from "@/lib/format/measures";

const GB = { locale: "en-GB", units: "metric" as const };
const GB_IMPERIAL = { locale: "en-GB", units: "imperial" as const };
const nb = (s: string) => s.replaceAll(" ", NBSP);

describe("the conversion constants", () => {
  // Exact by the international yard and pound agreement (1959); NIST SP 811 (2008), appendix B.
  it("are the defined values, and agree with mathjs's unit tables", () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(KG_PER_POUND).toBe(0.45359237);
    expect(KM_PER_MILE).toBe(1.609344);
    expect(mathUnit(1, "inch").toNumber("mm")).toBeCloseTo(MM_PER_INCH, 12);
    expect(mathUnit(1, "lbm").toNumber("kg")).toBeCloseTo(KG_PER_POUND, 12);
    expect(mathUnit(1, "mile").toNumber("km")).toBeCloseTo(KM_PER_MILE, 12);
  });
});

describe("lengths as a tape measure reads them", () => {
  // An imperial tape is marked in eighths (and sixteenths) of an inch: common practice, no published source.
  it("rounds inches to the nearest eighth and reduces the fraction", () => {
    expect(toEighths(45.8661)).toEqual({ negative: false, whole: 45, eighths: 7 });
    expect(toEighths(12.5)).toEqual({ negative: false, whole: 12, eighths: 4 });
    expect(toEighths(3.97)).toEqual({ negative: false, whole: 4, eighths: 0 });
    expect(formatInches(12.5, GB)).toBe(nb("12½ in"));
    expect(formatInches(0.375, GB)).toBe(nb("⅜ in"));
    expect(formatInches(0.25, GB)).toBe(nb("¼ in"));
    expect(formatInches(1167.34, GB)).toBe(nb("1,167⅜ in"));
    expect(formatInches(165.03, GB)).toBe(nb("165 in"));
  });
  it("shows a length held in mm in the group's units", () => {
    // 1165 mm ÷ 25.4 = 45.866 in, nearest eighth 45⅞ (mathjs for the division).
    const inches = mathUnit(1165, "mm").toNumber("inch");
    expect(Math.round(inches * 8) / 8).toBe(45.875);
    expect(formatLength(1165, GB_IMPERIAL)).toBe(nb("45⅞ in"));
    expect(formatLength(1165.4, GB)).toBe(nb("1,165 mm"));
    expect(formatMillimetres(29651.5, GB)).toBe(nb("29,652 mm"));
  });
  it("never lets a line break fall between the number and its unit", () => {
    for (const s of [formatLength(1165, GB), formatLength(1165, GB_IMPERIAL), formatMass(4.5, GB), formatDistance(2.4, GB), formatArea(1_063_000, GB)]) {
      expect(s).toMatch(/\d[⅛¼⅜½⅝¾⅞]?\u00a0\S+$/);
      expect(s).not.toMatch(/ /);
    }
  });
});

describe("areas, masses and distances", () => {
  it("gives m² to 0.01 and ft² to 0.1", () => {
    expect(formatArea(1_063_000, GB)).toBe(nb("1.06 m²"));
    // 1 ft² = 92,903.04 mm² (12 in × 25.4 mm squared; mathjs for the check).
    expect(mathUnit(1, "ft^2").toNumber("mm^2")).toBeCloseTo(92_903.04, 6);
    expect(formatArea(1_063_000, GB_IMPERIAL)).toBe(nb("11.4 ft²"));
  });
  it("gives kg or lb to 0.1, as a scale shows", () => {
    expect(formatMass(4.5, GB)).toBe(nb("4.5 kg"));
    // 4.5 kg = 9.92 lb (mathjs).
    expect(mathUnit(4.5, "kg").toNumber("lbm")).toBeCloseTo(9.921, 3);
    expect(formatMass(4.5, GB_IMPERIAL)).toBe(nb("9.9 lb"));
    expect(formatMass(12.34, GB)).toBe(nb("12.3 kg"));
  });
  it("gives km to 0.1 and metres to 10 under a kilometre; miles to 0.1 and yards under a tenth of a mile", () => {
    expect(formatDistance(2.44, GB)).toBe(nb("2.4 km"));
    expect(formatDistance(0.847, GB)).toBe(nb("850 m"));
    // 2.4 km = 1.49 mi; 0.1 km = 109.4 yd (mathjs).
    expect(mathUnit(2.4, "km").toNumber("mile")).toBeCloseTo(1.491, 3);
    expect(formatDistance(2.4, GB_IMPERIAL)).toBe(nb("1.5 mi"));
    expect(mathUnit(0.1, "km").toNumber("yard")).toBeCloseTo(109.36, 2);
    expect(formatDistance(0.1, GB_IMPERIAL)).toBe(nb("110 yd"));
  });
  it("writes the number in the group's locale", () => {
    // CLDR: en-ZA groups with a space and marks decimals with a comma (from memory; Intl carries CLDR).
    expect(formatMillimetres(1165, { locale: "en-ZA" })).toBe(`1\u00a0165${NBSP}mm`);
    expect(formatMass(4.5, { locale: "en-ZA", units: "metric" })).toBe(`4,5${NBSP}kg`);
  });
});
