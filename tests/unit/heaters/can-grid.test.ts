import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import { compareGlazingOptions, computeCanGrid } from "@/lib/heaters/can-grid";
import { MM_PER_INCH, fromMm, toMm } from "@/lib/heaters/schemas";

const inToMm = (inches: number) => mathUnit(inches, "inch").toNumber("mm");

describe("unit conversion", () => {
  it("one inch is exactly 25.4 mm, and our helpers agree with mathjs", () => {
    // Source: NIST SP 811 (the international inch is exactly 25.4 mm).
    expect(MM_PER_INCH).toBe(25.4);
    for (const inches of [1, 5, 28, 30, 60, 74]) {
      expect(toMm(inches, "in")).toBeCloseTo(inToMm(inches), 9);
      expect(fromMm(inToMm(inches), "in")).toBeCloseTo(inches, 9);
    }
    expect(toMm(127, "mm")).toBe(127);
    expect(fromMm(127, "in")).toBeCloseTo(mathUnit(127, "mm").toNumber("inch"), 12);
  });
});

describe("computeCanGrid — check values", () => {
  // Common practice, no published source: a 30 in × 60 in sheet over the
  // chamber only, 66 mm cans 122 mm long, no edge clearance → 11 × 12 = 132
  // cans, 528 holes at 4 holes per can.
  it("30 × 60 in, chamber only → 11 × 12 = 132 cans, 528 holes", () => {
    const grid = computeCanGrid({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" });
    expect(grid).toMatchObject({ columns: 11, rows: 12, cans: 132, holes: 528, unit: "in" });
  });

  it("the same sheet given in mm (via mathjs) gives the same grid", () => {
    const grid = computeCanGrid({
      glazingWidth: inToMm(30),
      glazingHeight: inToMm(60),
      unit: "mm",
      coverage: "chamber",
      canDiameter: 66,
      canLength: 122,
      edgeClearance: 0,
      holesPerCan: 4,
    });
    expect(grid).toMatchObject({ columns: 11, rows: 12, cans: 132, holes: 528, unit: "mm" });
    // Slack: 762 − 11·66 = 36 mm across, 1524 − 12·122 = 60 mm along.
    expect(grid.slack.width).toBeCloseTo(36, 9);
    expect(grid.slack.height).toBeCloseTo(60, 9);
  });

  // Common practice, no published source: 28 in × 74 in covering the chamber
  // and both 5 in manifolds → 10 × 13 = 130 cans.
  it("28 × 74 in, full coverage with 5 in manifolds → 10 × 13 = 130 cans", () => {
    const grid = computeCanGrid({ glazingWidth: 28, glazingHeight: 74, unit: "in", coverage: "full", manifoldHeight: 5 });
    expect(grid).toMatchObject({ columns: 10, rows: 13, cans: 130, holes: 520 });
  });

  it("the same full-coverage sheet in mm gives 130 cans (default manifold 127 mm = 5 in)", () => {
    const grid = computeCanGrid({ glazingWidth: inToMm(28), glazingHeight: inToMm(74), unit: "mm", coverage: "full" });
    expect(grid).toMatchObject({ columns: 10, rows: 13, cans: 130 });
    expect(inToMm(5)).toBe(127);
  });
});

describe("computeCanGrid — behaviour", () => {
  it("counts exact fits despite floating point (11 cans of 66 mm in 726 mm, given in inches)", () => {
    const grid = computeCanGrid({ glazingWidth: 726 / 25.4, glazingHeight: (5 * 122) / 25.4, unit: "in", coverage: "chamber" });
    expect(grid.columns).toBe(11);
    expect(grid.rows).toBe(5);
    expect(grid.slack.width).toBeGreaterThanOrEqual(0);
    expect(grid.slack.width).toBeLessThan(1e-9);
  });

  it("does not admit a can that is really too big", () => {
    expect(computeCanGrid({ glazingWidth: 725.9, glazingHeight: 610, unit: "mm", coverage: "chamber" }).columns).toBe(10);
  });

  it("a sheet too small for one can gives 0 cans without throwing", () => {
    const grid = computeCanGrid({ glazingWidth: 50, glazingHeight: 100, unit: "mm", coverage: "chamber" });
    expect(grid).toMatchObject({ columns: 0, rows: 0, cans: 0, holes: 0, apertureArea: 0 });
    expect(grid.slack).toEqual({ width: 50, height: 100 });
  });

  it("manifolds taller than the sheet or edges wider than it give 0, never negative", () => {
    const tall = computeCanGrid({ glazingWidth: 600, glazingHeight: 200, unit: "mm", coverage: "full" });
    expect(tall.rows).toBe(0);
    expect(tall.cans).toBe(0);
    expect(tall.slack.height).toBe(0);
    const edges = computeCanGrid({ glazingWidth: 100, glazingHeight: 600, unit: "mm", coverage: "chamber", edgeClearance: 60 });
    // Chamber 600 − 120 = 480 mm takes 3 rows of 122 mm, leaving 114 mm.
    expect(edges).toMatchObject({ columns: 0, rows: 3, cans: 0, slack: { width: 0, height: 114 } });
  });

  it("edge clearance comes off both sides", () => {
    const grid = computeCanGrid({ glazingWidth: 762, glazingHeight: 1524, unit: "mm", coverage: "chamber", edgeClearance: 20 });
    expect(grid.columns).toBe(10); // (762 − 40) / 66 = 10.94
    expect(grid.rows).toBe(12); // (1524 − 40) / 122 = 12.16
  });

  it("aperture area is the area the cans cover, in the unit squared", () => {
    const mm = computeCanGrid({ glazingWidth: 762, glazingHeight: 1524, unit: "mm", coverage: "chamber" });
    expect(mm.apertureArea).toBeCloseTo(11 * 66 * 12 * 122, 6);
    const inches = computeCanGrid({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" });
    expect(inches.apertureArea).toBeCloseTo(mm.apertureArea / 25.4 ** 2, 9);
  });

  it("outer size adds frame allowances, and the manifolds when the glazing covers only the chamber", () => {
    const chamber = computeCanGrid({
      glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber", frameAllowanceWidth: 3, frameAllowanceHeight: 3,
    });
    expect(chamber.outerSize).toEqual({ width: 33, height: 73 });
    const full = computeCanGrid({ glazingWidth: 28, glazingHeight: 74, unit: "in", coverage: "full", manifoldHeight: 5 });
    expect(full.outerSize).toEqual({ width: 28, height: 74 });
  });

  it("holes follow holesPerCan", () => {
    expect(computeCanGrid({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber", holesPerCan: 6 }).holes).toBe(792);
  });
});

describe("compareGlazingOptions", () => {
  it("ranks the sheet that yields more cans per m² first, across units", () => {
    const result = compareGlazingOptions([
      { label: "28 × 74 in, full", input: { glazingWidth: 28, glazingHeight: 74, unit: "in", coverage: "full" } },
      { label: "762 × 1524 mm, chamber", input: { glazingWidth: 762, glazingHeight: 1524, unit: "mm", coverage: "chamber" } },
    ]);
    expect(result.map((r) => r.label)).toEqual(["28 × 74 in, full", "762 × 1524 mm, chamber"]);
    expect(result[1].rank).toBe(1); // chamber-only glass is all over cans
    expect(result[0].rank).toBe(2);
    expect(result[1].cansPerM2).toBeCloseTo(132 / (0.762 * 1.524), 6);
    expect(result[0].glazingAreaM2).toBeCloseTo(inToMm(28) * inToMm(74) / 1e6, 9);
    expect(result[1].coverage).toBeGreaterThan(result[0].coverage);
  });

  it("breaks a tie on cans per m² by the covered share (less slack)", () => {
    const sheet = { glazingWidth: 726, glazingHeight: 610, unit: "mm", coverage: "chamber" } as const;
    const result = compareGlazingOptions([
      { label: "65 mm cans", input: { ...sheet, canDiameter: 65 } },
      { label: "66 mm cans", input: { ...sheet, canDiameter: 66 } },
    ]);
    expect(result.map((r) => r.grid.cans)).toEqual([55, 55]);
    expect(result.map((r) => r.rank)).toEqual([2, 1]);
  });

  it("keeps the given order on a full tie (the same sheet in two units)", () => {
    const ranks = compareGlazingOptions([
      { label: "in", input: { glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" } },
      { label: "mm", input: { glazingWidth: 762, glazingHeight: 1524, unit: "mm", coverage: "chamber" } },
    ]).map((r) => r.rank);
    expect(ranks).toEqual([1, 2]);
  });

  it("handles an empty list and a sheet with no cans", () => {
    expect(compareGlazingOptions([])).toEqual([]);
    const [tiny] = compareGlazingOptions([{ label: "tiny", input: { glazingWidth: 10, glazingHeight: 10, unit: "mm", coverage: "chamber" } }]);
    expect(tiny).toMatchObject({ cansPerM2: 0, coverage: 0, rank: 1 });
  });
});
