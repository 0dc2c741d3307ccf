import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import {
  DEFAULT_BEAD_DIAMETER_MM,
  DEFAULT_CARTRIDGE_ML,
  US_FL_OZ_ML,
  beadLengthPerCartridge,
  computeMaterials,
} from "@/lib/heaters/materials";

const sheet30x60 = { glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" } as const;

describe("beadLengthPerCartridge", () => {
  it("a 10.1 US fl oz cartridge as a round 3/8 in bead runs about 13.75 ft", () => {
    // L = V ÷ (π·d²/4); US fl oz = 29.5735295625 mL exactly (NIST Handbook 44).
    expect(US_FL_OZ_ML).toBe(29.5735295625);
    expect(DEFAULT_CARTRIDGE_ML).toBeCloseTo(mathUnit(10.1, "floz").toNumber("mL"), 9);
    expect(DEFAULT_BEAD_DIAMETER_MM).toBeCloseTo(mathUnit(0.375, "inch").toNumber("mm"), 12);
    const volumeIn3 = mathUnit(10.1, "floz").toNumber("inch^3");
    const feet = beadLengthPerCartridge(volumeIn3, 0.375) / 12;
    expect(Math.abs(feet - 13.75) / 13.75).toBeLessThan(0.01);
    // the same in millimetres
    const mm = beadLengthPerCartridge(DEFAULT_CARTRIDGE_ML * 1000, DEFAULT_BEAD_DIAMETER_MM);
    expect(mathUnit(mm, "mm").toNumber("ft")).toBeCloseTo(feet, 9);
  });

  it("gives 0 rather than Infinity for a zero bead", () => {
    expect(beadLengthPerCartridge(100, 0)).toBe(0);
  });
});

describe("computeMaterials", () => {
  it("a 30 × 60 in sheet: joints, bead and cartridges", () => {
    const m = computeMaterials(sheet30x60);
    expect(m.grid.cans).toBe(132);
    // 11 columns × (12 − 1 can-to-can + 2 manifold joints) = 143 rings of π·d.
    expect(m.adhesive.joints).toBe(143);
    const d = 66 / 25.4;
    expect(m.adhesive.beadLength).toBeCloseTo(143 * Math.PI * d, 9);
    expect(m.adhesive.beadLengthPerCartridge / 12).toBeCloseTo(13.75, 1);
    // 1167.4 in × 1.1 ÷ 165.0 in = 7.78 → 8 cartridges
    expect(m.adhesive.cartridges).toBe(8);
    expect(m.lines.find((l) => l.key === "adhesive")).toMatchObject({ quantity: 8, measure: "cartridge" });
  });

  it("counts only can-to-can joints when asked, and no adhesive for no cans", () => {
    expect(computeMaterials(sheet30x60, { manifoldJoints: false }).adhesive.joints).toBe(11 * 11);
    const none = computeMaterials({ ...sheet30x60, glazingWidth: 1, glazingHeight: 1 });
    expect(none.adhesive).toMatchObject({ joints: 0, beadLength: 0, cartridges: 0 });
  });

  it("an exact fill does not buy an extra cartridge", () => {
    const m = computeMaterials(sheet30x60, { adhesiveAllowance: 0 });
    const exact = computeMaterials(sheet30x60, {
      adhesiveAllowance: 0,
      cartridgeVolumeMl: (DEFAULT_CARTRIDGE_ML * m.adhesive.beadLength) / (5 * m.adhesive.beadLengthPerCartridge),
    });
    expect(exact.adhesive.cartridges).toBe(5);
  });

  it("areas and lengths in the plan's unit, lines in trade measures", () => {
    const m = computeMaterials({ ...sheet30x60, frameAllowanceWidth: 3, frameAllowanceHeight: 3 }, { boxDepth: 6 });
    expect(m.glazingArea).toBe(1800);
    expect(m.grid.outerSize).toEqual({ width: 33, height: 73 }); // manifolds outside the glazing
    expect(m.lumberLength).toBe(2 * (33 + 73));
    expect(m.insulationArea).toBe(33 * 73 + 212 * 6);
    const d = 66 / 25.4;
    const l = 122 / 25.4;
    expect(m.paintArea).toBeCloseTo(Math.PI * d * l * 132 + 1800, 9);
    const byKey = Object.fromEntries(m.lines.map((line) => [line.key, line]));
    expect(byKey.glazing).toMatchObject({ quantity: 12.5, measure: "ft2" }); // 1800 in² ÷ 144
    expect(byKey.frameLumber.measure).toBe("ft");
    expect(byKey.frameLumber.quantity).toBeCloseTo(mathUnit(212, "inch").toNumber("ft"), 12);
    for (const key of ["fan", "thermostatSwitch", "backdraftDamper"]) {
      expect(byKey[key]).toMatchObject({ quantity: 1, measure: "each" });
    }
  });

  it("uses m² and m for millimetre plans", () => {
    const m = computeMaterials({ glazingWidth: 762, glazingHeight: 1524, unit: "mm", coverage: "chamber" });
    const glazing = m.lines.find((l) => l.key === "glazing");
    expect(glazing?.measure).toBe("m2");
    expect(glazing?.quantity).toBeCloseTo(mathUnit(1800, "inch^2").toNumber("m^2"), 12);
    // same sheet, same cartridges as the inch plan
    expect(m.adhesive.cartridges).toBe(computeMaterials(sheet30x60).adhesive.cartridges);
  });

  it("prices give a cost; missing prices leave it incomplete", () => {
    expect(computeMaterials(sheet30x60).cost).toBeNull();
    const partial = computeMaterials(sheet30x60, { prices: { glazing: 4, fan: 30 } });
    expect(partial.cost).toEqual({ total: 12.5 * 4 + 30, complete: false });
    const m = computeMaterials(sheet30x60, {
      prices: {
        glazing: 4, absorberPaint: 0.5, adhesive: 8, frameLumber: 1.2,
        insulation: 0.8, fan: 30, thermostatSwitch: 20, backdraftDamper: 12,
      },
    });
    const expected = m.lines.reduce((sum, line) => sum + line.quantity * (line.unitPrice ?? 0), 0);
    expect(m.cost?.complete).toBe(true);
    expect(m.cost?.total).toBeCloseTo(expected, 9);
  });
});
