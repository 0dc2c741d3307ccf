import { describe, expect, it } from "vitest";
import { allowedMoves, checkStateMove } from "@/lib/heaters/states";
import { buildSteps } from "@/lib/heaters/build-steps";

// The unit life-cycle rule (our own product rule, stated in lib/heaters/states.ts)
// and the cautions every build sheet must carry.
describe("heater unit state moves", () => {
  it("lets builders and organisers move forward, one or more steps", () => {
    expect(checkStateMove("planned", "claiming", "builder").ok).toBe(true);
    expect(checkStateMove("planned", "installed", "builder").ok).toBe(true);
    expect(checkStateMove("claiming", "building", "organiser").ok).toBe(true);
  });

  it("lets only organisers step back, one step at a time", () => {
    expect(checkStateMove("building", "claiming", "builder").ok).toBe(false);
    expect(checkStateMove("building", "claiming", "organiser").ok).toBe(true);
    expect(checkStateMove("installed", "claiming", "organiser").ok).toBe(false);
    expect(checkStateMove("claiming", "claiming", "organiser").ok).toBe(false);
    expect(checkStateMove("planned", "claiming", "volunteer").ok).toBe(false);
  });

  it("offers exactly the allowed moves", () => {
    expect(allowedMoves("claiming", "builder")).toEqual(["building", "installed"]);
    expect(allowedMoves("claiming", "organiser")).toEqual(["planned", "building", "installed"]);
    expect(allowedMoves("installed", "builder")).toEqual([]);
  });
});

describe("build steps", () => {
  it("carry the counts and every caution of the trade", () => {
    // Common practice, no published source: the cautions of a can heater build.
    const steps = buildSteps({ cans: 132, holes: 528, holesPerCan: 4, columns: 11, rows: 12 });
    const text = steps.map((s) => `${s.text} ${s.caution ?? ""}`).join(" ");
    expect(text).toContain("132 washed cans");
    expect(text).toContain("528 holes");
    for (const caution of ["gloves", "eye protection", "hearing protection", "ventilat", "over-temperature switch", "backdraft damper", "licensed electrician", "building code"]) {
      expect(text).toContain(caution);
    }
  });
});
