import { describe, expect, it } from "vitest";
import {
  DEFAULT_CANS_PER_BAG,
  DEFAULT_GRAMS_PER_CAN,
  DEFAULT_PRIOR_HAULS,
  GRAMS_PER_POUND,
  blendedRatio,
  calibrationFrom,
  estimateHaulCans,
  type CountedBatch,
} from "@/lib/ledger/estimate";

const POUND_KG = 0.45359237; // exact by definition (NIST SP 811, Appendix B)

/** n counted hauls of 1 kg each that all counted 70 cans. */
const at70PerKg = (n: number): CountedBatch[] =>
  Array.from({ length: n }, () => ({ hauls: 1, counted: 70, bags: 1, weightKg: 1 }));

describe("estimateHaulCans by weight", () => {
  it("1 lb of cans is 34 cans", () => {
    // Source: 34 cans per pound, aluminium can industry trade associations (2009);
    // 1 lb = 453.59237 g exactly (NIST SP 811).
    expect(GRAMS_PER_POUND).toBe(453.59237);
    const e = estimateHaulCans({ bags: 1, weightKg: POUND_KG });
    expect(e).toEqual({ cans: 34, method: "weight", perUnit: 1000 / DEFAULT_GRAMS_PER_CAN, basis: { countedHauls: 0, calibrated: false } });
  });

  it("the default is about 13.34 g per can", () => {
    // Source: 453.59237 g ÷ 34 = 13.3409 g (NIST SP 811 pound; trade associations' 34 per pound).
    expect(DEFAULT_GRAMS_PER_CAN).toBeCloseTo(13.34, 2);
  });

  it("0 kg is 0 cans, even with bags", () => {
    expect(estimateHaulCans({ bags: 0, weightKg: 0 }).cans).toBe(0);
    expect(estimateHaulCans({ bags: 2, weightKg: 0 })).toMatchObject({ cans: 0, method: "weight" });
  });

  it("10 kg is 750 cans (1000 ÷ 13.3409 = 74.957 cans/kg)", () => {
    // Hand calculation: 10 × 74.957 = 749.57 → 750.
    expect(estimateHaulCans({ bags: 3, weightKg: 10 }).cans).toBe(750);
  });

  it("subtracts bag tare when asked", () => {
    // 3 bags weighed 10.15 kg gross with 50 g bags → 10 kg net → 750 cans.
    expect(estimateHaulCans({ bags: 3, weightKg: 10.15 }, undefined, { bagTareKg: 0.05 }).cans).toBe(750);
  });
});

describe("estimateHaulCans by bags", () => {
  it("uses the default cans per bag when not weighed", () => {
    expect(DEFAULT_CANS_PER_BAG).toBe(60);
    expect(estimateHaulCans({ bags: 3 })).toEqual({
      cans: 180,
      method: "bags",
      perUnit: 60,
      basis: { countedHauls: 0, calibrated: false },
    });
    expect(estimateHaulCans({ bags: 2, weightKg: null }).cans).toBe(120);
  });

  it("calibrates from counted bags", () => {
    // 4 counted hauls, 8 bags, 720 cans → 90 per bag observed.
    // Hand calculation with k = 3: (3·60 + 4·90) / 7 = 540/7 = 77.14 per bag; 2 bags → 154.
    const cal = calibrationFrom([
      { hauls: 2, counted: 360, bags: 4, weightKg: null },
      { hauls: 2, counted: 360, bags: 4, weightKg: null },
    ]);
    const e = estimateHaulCans({ bags: 2 }, cal);
    expect(e.perUnit).toBeCloseTo(540 / 7, 12);
    expect(e.cans).toBe(154);
    expect(e.basis).toEqual({ countedHauls: 4, calibrated: true });
  });
});

describe("calibration", () => {
  it("moves the estimate for 1 kg from ~75 toward the counted 70 cans/kg", () => {
    // Hand calculation, prior 74.957 cans/kg, k = 3 pseudo-hauls:
    //   0 hauls → 74.96 → 75;  1 haul → (3·74.957 + 70)/4 = 73.72 → 74;
    //   3 hauls → (3·74.957 + 3·70)/6 = 72.48 → 72;  300 hauls → 70.05 → 70.
    expect(DEFAULT_PRIOR_HAULS).toBe(3);
    const cansFor1Kg = (n: number) => estimateHaulCans({ bags: 1, weightKg: 1 }, calibrationFrom(at70PerKg(n)));
    expect(cansFor1Kg(0).cans).toBe(75);
    expect(cansFor1Kg(1).cans).toBe(74);
    expect(cansFor1Kg(3).cans).toBe(72);
    expect(cansFor1Kg(300).cans).toBe(70);
    let previous = Infinity;
    for (const n of [0, 1, 2, 5, 10, 30, 100, 1000]) {
      const perKg = cansFor1Kg(n).perUnit;
      expect(perKg).toBeLessThan(previous);
      expect(perKg).toBeGreaterThanOrEqual(70);
      previous = perKg;
    }
    expect(cansFor1Kg(1000).perUnit).toBeCloseTo(70, 1);
    expect(cansFor1Kg(5).basis).toEqual({ countedHauls: 5, calibrated: true });
  });

  it("uses the pooled ratio Σcounted ÷ Σkg, not an average of ratios", () => {
    // 100 cans in 1 kg and 300 cans in 5 kg: pooled 400/6 = 66.67, mean of ratios would be 80.
    const cal = calibrationFrom([
      { hauls: 1, counted: 100, bags: 1, weightKg: 1 },
      { hauls: 1, counted: 300, bags: 2, weightKg: 5 },
    ]);
    expect(cal.weight).toEqual({ hauls: 2, cans: 400, kg: 6 });
    expect(estimateHaulCans({ bags: 1, weightKg: 1 }, cal, { priorHauls: 0 }).perUnit).toBeCloseTo(400 / 6, 12);
  });

  it("keeps sorts with an unweighed haul out of the weight ratio but in the bag ratio", () => {
    const cal = calibrationFrom([{ hauls: 2, counted: 150, bags: 3, weightKg: null }]);
    expect(cal.weight).toEqual({ hauls: 0, cans: 0, kg: 0 });
    expect(cal.bags).toEqual({ hauls: 2, cans: 150, bags: 3 });
    expect(estimateHaulCans({ bags: 1, weightKg: 1 }, cal).basis.calibrated).toBe(false);
  });

  it("blendedRatio falls back to the prior without evidence", () => {
    expect(blendedRatio(60, 0, 0, 0, 3)).toBe(60);
    expect(blendedRatio(60, 100, 0, 2, 3)).toBe(60);
  });
});

describe("input guards", () => {
  it("rejects negative or non-finite amounts", () => {
    expect(() => estimateHaulCans({ bags: -1 })).toThrow(RangeError);
    expect(() => estimateHaulCans({ bags: 1, weightKg: -2 })).toThrow(RangeError);
    expect(() => estimateHaulCans({ bags: Number.NaN })).toThrow(RangeError);
    expect(() => estimateHaulCans({ bags: 1 }, undefined, { cansPerBag: 0 })).toThrow(RangeError);
  });
});
