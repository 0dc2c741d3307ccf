import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import { ApiClient } from "@/tests/support/http";

// The planner's endpoints, open to anyone, checked against facts from outside
// the project. Each check names its source.
const anon = new ApiClient();

type Grid = { columns: number; rows: number; cans: number; holes: number; slack: { width: number; height: number }; apertureArea: number; unit: string };
type Heat = { efficiency: number; usefulW: number; usefulBtuh: number; airRiseC: number; outletC: number };

const grid = (body: unknown, headers?: Record<string, string>) => anon.json<Grid>("POST", "/api/plan/can-grid", body, headers);
const heat = (body: unknown) => anon.json<Heat>("POST", "/api/plan/heat-output", body);

describe("POST /api/plan/can-grid", () => {
  it("fits 11 × 12 = 132 cans and 528 holes behind a 30 × 60 in chamber sheet", async () => {
    // Common practice, no published source: a 30 in × 60 in sheet over the can
    // chamber with 66 mm cans stacked at 122 mm takes 11 columns of 12 cans,
    // 4 holes punched per can.
    const res = await grid({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber", edgeClearance: 0 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ columns: 11, rows: 12, cans: 132, holes: 528, unit: "in" });
    // Slack in inches: 30 − 11·66/25.4 and 60 − 12·122/25.4 (inch = 25.4 mm exactly, NIST SP 811).
    expect(res.body.slack.width).toBeCloseTo(30 - (11 * 66) / 25.4, 9);
    expect(res.body.slack.height).toBeCloseTo(60 - (12 * 122) / 25.4, 9);
    expect(res.body.apertureArea).toBeCloseTo(((11 * 66) / 25.4) * ((12 * 122) / 25.4), 6);
  });

  it("fits 10 × 13 = 130 cans behind a 28 × 74 in sheet over chamber and both 5 in manifolds", async () => {
    // Common practice, no published source.
    const res = await grid({ glazingWidth: 28, glazingHeight: 74, unit: "in", coverage: "full", manifoldHeight: 5 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ columns: 10, rows: 13, cans: 130, holes: 520 });
  });

  it("gives the same grid for the sheet measured in millimetres (inch = 25.4 mm, NIST SP 811, via mathjs)", async () => {
    // mathjs is an outside reference for the conversion.
    const w = mathUnit(30, "inch").toNumber("mm");
    const h = mathUnit(60, "inch").toNumber("mm");
    expect(w).toBeCloseTo(762, 9);
    const res = await grid({ glazingWidth: w, glazingHeight: h, unit: "mm", coverage: "chamber" });
    expect(res.body).toMatchObject({ columns: 11, rows: 12, cans: 132, holes: 528, unit: "mm" });
    const inches = await grid({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" });
    expect(mathUnit(inches.body.slack.width, "inch").toNumber("mm")).toBeCloseTo(res.body.slack.width, 6);
    expect(mathUnit(inches.body.apertureArea, "inch^2").toNumber("mm^2")).toBeCloseTo(res.body.apertureArea, 3);
  });

  it("accepts an Idempotency-Key header harmlessly", async () => {
    const body = { glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" };
    const a = await grid(body, { "Idempotency-Key": "plan-1" });
    const b = await grid(body, { "Idempotency-Key": "plan-1" });
    expect(a.status).toBe(200);
    expect(b.body).toEqual(a.body);
  });

  it("answers bad input with 422 and a message per field", async () => {
    const res = await anon.json<{ error: { code: string; fields: Record<string, string> } }>("POST", "/api/plan/can-grid", {
      glazingWidth: -30,
      glazingHeight: "sixty",
      unit: "cm",
      holesPerCan: 2.5,
    });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_input");
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["coverage", "glazingHeight", "glazingWidth", "holesPerCan", "unit"]);
    const notJson = await anon.json<{ error: { fields: Record<string, string> } }>("POST", "/api/plan/can-grid", "{oops", { "content-type": "application/json" });
    expect(notJson.status).toBe(422);
    expect(notJson.body.error.fields).toBeDefined();
  });
});

describe("POST /api/plan/heat-output", () => {
  const base = { apertureAreaM2: 1, irradianceWm2: 800, eta0: 0.7, a1: 5, inletC: 20, ambientC: 0, airflowM3h: 170 };

  it("gives η = 0.575 for FR(τα) = 0.70, FR·UL = 5 W/(m²·K), ΔT = 20 K, G = 800 W/m²", async () => {
    // Hottel–Whillier–Bliss form, Duffie & Beckman, Solar Engineering of Thermal Processes, ch. 6:
    // η = FR(τα) − FR·UL·ΔT/G = 0.70 − 5·20/800 = 0.575.
    const res = await heat(base);
    expect(res.status).toBe(200);
    expect(res.body.efficiency).toBeCloseTo(0.575, 12);
    expect(res.body.usefulW).toBeCloseTo(0.575 * 800, 9);
    expect(res.body.outletC).toBeCloseTo(20 + res.body.airRiseC, 9);
  });

  it("agrees within 0.5 % with BTU/h = 1.08 × CFM × ΔT°F: 100 CFM and 30 °F → 3240 BTU/h", async () => {
    // ASHRAE Handbook—Fundamentals, sensible heat of standard air:
    // 1.08 = 0.075 lb/ft³ × 60 min/h × 0.24 Btu/(lb·°F).
    expect(0.075 * 60 * 0.24).toBeCloseTo(1.08, 12);
    const btuh = 1.08 * 100 * 30;
    expect(btuh).toBeCloseTo(3240, 9);
    // 100 CFM in m³/h (foot = 0.3048 m exactly, NIST SP 811, via mathjs); 1 W = 3.412141633 Btu/h (IT).
    const airflowM3h = mathUnit(100, "ft^3/min").toNumber("m^3/h");
    const wattsNeeded = btuh / 3.412141633;
    const res = await heat({ ...base, apertureAreaM2: wattsNeeded / (0.575 * 800), airflowM3h });
    expect(res.body.usefulBtuh).toBeCloseTo(3240, 6);
    // The SI form (ρ = 1.2 kg/m³, cp = 1005 J/(kg·K)) gives the air rise; 30 °F of rise is 30/1.8 K.
    const riseF = res.body.airRiseC * 1.8;
    expect(Math.abs(riseF - 30) / 30).toBeLessThan(0.005);
  });

  it("answers bad input with 422 and a message per field", async () => {
    const res = await anon.json<{ error: { fields: Record<string, string> } }>("POST", "/api/plan/heat-output", {
      ...base,
      irradianceWm2: 0,
      eta0: 1.5,
      airflowM3h: undefined,
    });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["airflowM3h", "eta0", "irradianceWm2"]);
  });
});
