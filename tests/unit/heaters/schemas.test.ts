import { describe, expect, it } from "vitest";
import { z } from "zod";
import { unit as mathUnit } from "mathjs";
import { canGridInputSchema, heatOutputInputSchema } from "@/lib/heaters/schemas";

const fieldErrors = (result: { success: boolean; error?: z.ZodError }) =>
  result.error ? (z.flattenError(result.error).fieldErrors as Record<string, string[] | undefined>) : {};

const sheet = { glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" } as const;
const heat = { apertureAreaM2: 1.2, irradianceWm2: 800, eta0: 0.7, a1: 5, inletC: 20, ambientC: 0, airflowM3h: 200 };

describe("canGridInputSchema", () => {
  it("fills the millimetre defaults when the unit is mm", () => {
    const parsed = canGridInputSchema.parse({ ...sheet, unit: "mm", glazingWidth: 762, glazingHeight: 1524 });
    expect(parsed).toMatchObject({
      canDiameter: 66, canLength: 122, manifoldHeight: 127, edgeClearance: 0, holesPerCan: 4,
      frameAllowanceWidth: 0, frameAllowanceHeight: 0,
    });
  });

  it("converts the defaults to inches exactly by 25.4 (checked with mathjs; NIST SP 811)", () => {
    const parsed = canGridInputSchema.parse(sheet);
    expect(parsed.canDiameter).toBeCloseTo(mathUnit(66, "mm").toNumber("inch"), 12);
    expect(parsed.canLength).toBeCloseTo(mathUnit(122, "mm").toNumber("inch"), 12);
    expect(parsed.manifoldHeight).toBeCloseTo(5, 12);
    expect(parsed.holesPerCan).toBe(4);
  });

  it("keeps values the client sent", () => {
    const parsed = canGridInputSchema.parse({ ...sheet, canDiameter: 2.6, holesPerCan: 6, edgeClearance: 0.5 });
    expect(parsed).toMatchObject({ canDiameter: 2.6, holesPerCan: 6, edgeClearance: 0.5 });
  });

  it.each([
    ["negative", -30, "Glazing width must be greater than 0"],
    ["zero", 0, "Glazing width must be greater than 0"],
    ["NaN", Number.NaN, "Glazing width must be a number"],
    ["a string", "30", "Glazing width must be a number"],
    ["infinite", Number.POSITIVE_INFINITY, "Glazing width must be a number"],
    ["huge", 1e9, "Glazing width must be at most 393.7 in"],
  ])("rejects a %s glazing width with a field message", (_label, value, message) => {
    const result = canGridInputSchema.safeParse({ ...sheet, glazingWidth: value });
    expect(result.success).toBe(false);
    expect(fieldErrors(result).glazingWidth).toEqual([message]);
  });

  it("states limits in the request's unit", () => {
    const result = canGridInputSchema.safeParse({ ...sheet, unit: "mm", glazingHeight: 20_000 });
    expect(fieldErrors(result).glazingHeight).toEqual(["Glazing height must be at most 10000 mm"]);
  });

  it("catches millimetres typed into an inch form through the can limits", () => {
    const result = canGridInputSchema.safeParse({ ...sheet, canDiameter: 66 });
    expect(fieldErrors(result).canDiameter).toEqual(["Can diameter must be at most 11.8 in"]);
  });

  it("rejects a missing field, a bad unit and fractional holes", () => {
    const result = canGridInputSchema.safeParse({ glazingWidth: 30, unit: "cm", coverage: "all", holesPerCan: 2.5 });
    const errors = fieldErrors(result);
    expect(errors.glazingHeight).toEqual(["Glazing height is required"]);
    expect(errors.unit).toEqual(['Unit must be "mm" or "in"']);
    expect(errors.coverage).toEqual(['Coverage must be "chamber" or "full"']);
    expect(errors.holesPerCan).toEqual(["Holes per can must be a whole number"]);
  });

  it("allows zero edge clearance but not a negative one", () => {
    expect(canGridInputSchema.safeParse({ ...sheet, edgeClearance: 0 }).success).toBe(true);
    expect(fieldErrors(canGridInputSchema.safeParse({ ...sheet, edgeClearance: -1 })).edgeClearance).toEqual([
      "Edge clearance cannot be negative",
    ]);
  });
});

describe("heatOutputInputSchema", () => {
  it("accepts a sensible body", () => {
    expect(heatOutputInputSchema.parse(heat)).toEqual(heat);
  });

  it.each([
    ["apertureAreaM2", 0, "Aperture area must be greater than 0 m²"],
    ["apertureAreaM2", 1e6, "Aperture area must be at most 100 m²"],
    ["irradianceWm2", -5, "Irradiance must be greater than 0 W/m²"],
    ["irradianceWm2", 5000, "Irradiance must be at most 1400 W/m²"],
    ["eta0", 1.5, "Optical efficiency η0 must be at most 1"],
    ["a1", Number.NaN, "Heat loss coefficient a1 must be a number"],
    ["inletC", "20", "Inlet temperature must be a number"],
    ["ambientC", -300, "Outdoor temperature must be at least −60 °C"],
    ["airflowM3h", 0, "Airflow must be greater than 0 m³/h"],
  ])("rejects %s = %s", (field, value, message) => {
    const result = heatOutputInputSchema.safeParse({ ...heat, [field]: value });
    expect(result.success).toBe(false);
    expect(fieldErrors(result)[field]).toEqual([message]);
  });

  it("names every missing field", () => {
    const errors = fieldErrors(heatOutputInputSchema.safeParse({}));
    expect(Object.keys(errors).sort()).toEqual(Object.keys(heat).sort());
  });
});
