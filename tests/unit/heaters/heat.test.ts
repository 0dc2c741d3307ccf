import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import {
  AIR_CP_J_KG_K,
  AIR_DENSITY_KG_M3,
  BTUH_PER_W,
  airTemperatureRiseC,
  collectorEfficiency,
  computeHeatOutput,
  heatAtPeak,
  RATING_IRRADIANCE_WM2,
  sensibleHeatBtuh,
} from "@/lib/heaters/heat";

describe("sensibleHeatBtuh", () => {
  it("100 CFM warmed 30 °F carries 3240 BTU/h", () => {
    // Source: ASHRAE Handbook—Fundamentals, sensible heat of standard air:
    // BTU/h = 1.08 × CFM × ΔT°F, 1.08 = 0.075 lb/ft³ × 60 min/h × 0.24 Btu/(lb·°F).
    expect(0.075 * 60 * 0.24).toBeCloseTo(1.08, 12);
    expect(sensibleHeatBtuh(100, 30)).toBeCloseTo(3240, 9);
  });

  it("the SI form with ρ = 1.2 kg/m³ and cp = 1005 J/(kg·K) agrees within 0.5 %", () => {
    // Conversions by mathjs; a temperature *difference* in °F is one in °R.
    const m3s = mathUnit(100, "ft^3/min").toNumber("m^3/s");
    const dK = mathUnit(30, "degR").toNumber("K");
    const watts = AIR_DENSITY_KG_M3 * AIR_CP_J_KG_K * m3s * dK;
    const btuh = mathUnit(watts, "W").toNumber("BTU/h");
    expect(Math.abs(btuh - 3240) / 3240).toBeLessThan(0.005);
    // and our own airflow handling gives the same rise back
    expect(airTemperatureRiseC(watts, m3s * 3600)).toBeCloseTo(dK, 9);
  });

  it("1 W is 3.412141633 BTU/h (IT Btu), as mathjs has it", () => {
    expect(BTUH_PER_W).toBeCloseTo(mathUnit(1, "W").toNumber("BTU/h"), 6);
  });
});

describe("collectorEfficiency", () => {
  it("FR(τα) = 0.70, FR·UL = 5 W/(m²·K), ΔT = 20 K, G = 800 W/m² → η = 0.575", () => {
    // Source: Hottel–Whillier–Bliss form, Duffie & Beckman, Solar Engineering
    // of Thermal Processes, ch. 6: η = FR(τα) − FR·UL·(Ti − Ta)/G.
    expect(collectorEfficiency(0.7, 5, 20, 800)).toBeCloseTo(0.575, 12);
  });

  it("is floored at 0 and never divides by zero irradiance", () => {
    expect(collectorEfficiency(0.7, 5, 200, 800)).toBe(0);
    expect(collectorEfficiency(0.7, 5, 20, 0)).toBe(0);
  });
});

describe("computeHeatOutput", () => {
  const base = { apertureAreaM2: 1.5, irradianceWm2: 800, eta0: 0.7, a1: 5, inletC: 20, ambientC: 0, airflowM3h: 180 };

  it("combines efficiency, useful heat and air rise", () => {
    const out = computeHeatOutput(base);
    expect(out.efficiency).toBeCloseTo(0.575, 12);
    expect(out.usefulW).toBeCloseTo(0.575 * 800 * 1.5, 9); // 690 W
    expect(out.usefulBtuh).toBeCloseTo(690 * 3.412141633, 6);
    // ΔT = 690 / (1.2 × 1005 × 0.05) = 11.443 K
    expect(out.airRiseC).toBeCloseTo(690 / (1.2 * 1005 * 0.05), 9);
    expect(out.outletC).toBeCloseTo(20 + out.airRiseC, 12);
  });

  it("doubling the airflow halves the rise for the same heat", () => {
    const a = computeHeatOutput(base);
    const b = computeHeatOutput({ ...base, airflowM3h: 360 });
    expect(b.usefulW).toBeCloseTo(a.usefulW, 12);
    expect(b.airRiseC).toBeCloseTo(a.airRiseC / 2, 12);
  });

  it("a collector colder than its losses delivers nothing (not negative heat)", () => {
    const out = computeHeatOutput({ ...base, irradianceWm2: 50, inletC: 20, ambientC: -10 });
    expect(out).toEqual({ efficiency: 0, usefulW: 0, usefulBtuh: 0, airRiseC: 0, outletC: 20 });
  });

  it("zero airflow gives no delivered heat and no infinite rise", () => {
    const out = computeHeatOutput({ ...base, airflowM3h: 0 });
    expect(out).toEqual({ efficiency: 0, usefulW: 0, usefulBtuh: 0, airRiseC: 0, outletC: 20 });
    expect(Object.values(out).every(Number.isFinite)).toBe(true);
  });
});

describe("heatAtPeak", () => {
  const base = { apertureAreaM2: 1.5, eta0: 0.7, a1: 5, inletC: 18, ambientC: 5, airflowM3h: 170 };

  it("uses the wall's peak sunlight in the straight-line efficiency, so a lower peak gives a lower efficiency than 800 W/m²", () => {
    // Hottel–Whillier–Bliss, η = FR(τα) − FR·UL·ΔT/G (Duffie & Beckman, Solar Engineering of Thermal
    // Processes, ch. 6): at G = 578 W/m², ΔT = 13 K: η = 0.7 − 65/578 = 0.58754…, worked by hand.
    const out = heatAtPeak(base, 578);
    expect(out.efficiency).toBeCloseTo(0.7 - 65 / 578, 12);
    expect(out.usefulW).toBeCloseTo((0.7 - 65 / 578) * 578 * 1.5, 9);
    expect(out.efficiency).toBeLessThan(computeHeatOutput({ ...base, irradianceWm2: RATING_IRRADIANCE_WM2 }).efficiency);
  });

  it("gives no heat, not an error, when the sun never reaches the wall that day", () => {
    expect(heatAtPeak(base, 0)).toEqual({ efficiency: 0, usefulW: 0, usefulBtuh: 0, airRiseC: 0, outletC: 18 });
  });
});
