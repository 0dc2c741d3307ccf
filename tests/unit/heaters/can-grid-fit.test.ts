import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import { computeCanGrid, fitProblems, minimumSheet } from "@/lib/heaters/can-grid";

// The smallest sheet for one can: one can diameter across, one can length up, plus the
// clearances and (when the sheet covers them) both manifolds. The 66 mm × 122 mm can is the
// planner's default (common practice, no published source); inches by mathjs (NIST SP 811 inch).
const inch = (mm: number) => mathUnit(mm, "mm").toNumber("inch");

describe("minimumSheet", () => {
  it("is d + 2e across and L + 2e (+ 2m with full coverage) up, and exactly that size holds one can", () => {
    const input = { glazingWidth: 1, glazingHeight: 1, unit: "mm", coverage: "full", manifoldHeight: 127, edgeClearance: 10 } as const;
    const min = minimumSheet(input);
    expect(min).toEqual({ width: 66 + 20, height: 122 + 20 + 254 });
    expect(computeCanGrid({ ...input, glazingWidth: min.width, glazingHeight: min.height }).cans).toBe(1);
    expect(computeCanGrid({ ...input, glazingWidth: min.width - 0.5, glazingHeight: min.height }).cans).toBe(0);
    expect(computeCanGrid({ ...input, glazingWidth: min.width, glazingHeight: min.height - 0.5 }).cans).toBe(0);
  });
});

describe("fitProblems", () => {
  it("says a 2 in sheet is too narrow for one column, and by how much, instead of a silent 0", () => {
    const input = { glazingWidth: 2, glazingHeight: 60, unit: "in", coverage: "chamber" } as const;
    expect(computeCanGrid(input).cans).toBe(0);
    const [problem, ...rest] = fitProblems(input);
    expect(rest).toEqual([]);
    expect(inch(66)).toBeCloseTo(2.598, 3);
    // Lengths as a tape measure reads them, to the nearest eighth: 2.598 in → 2⅝ in; a no-break space before the unit.
    expect(problem).toBe("Too narrow for one column of cans: a column needs 2⅝\u00a0in across (one 2⅝\u00a0in can), and this sheet is 2\u00a0in. Use a wider sheet or a smaller clearance.");
  });

  it("blames the manifolds when a full-coverage sheet loses its only row to them", () => {
    // 20 in of sheet minus two 5 in manifolds leaves 10 in, above the 4.8 in can (122 mm); 8 in leaves none.
    expect(fitProblems({ glazingWidth: 30, glazingHeight: 20, unit: "in", coverage: "full", manifoldHeight: 5 })).toEqual([]);
    const [problem] = fitProblems({ glazingWidth: 30, glazingHeight: 8, unit: "in", coverage: "full", manifoldHeight: 5 });
    // 122 mm = 4.803 in → 4¾ in to the nearest eighth; with two 5 in manifolds, 14¾ in.
    expect(problem).toMatch(/^Too short for one row of cans: a row needs 14¾\u00a0in up \(one 4¾\u00a0in can, two 5\u00a0in manifolds\), and this sheet is 8\u00a0in\./);
    expect(problem).toContain("lower manifolds");
  });

  it("names both directions for a sheet too small either way, and nothing for the 30 × 60 in check sheet", () => {
    expect(fitProblems({ glazingWidth: 50, glazingHeight: 50, unit: "mm", coverage: "chamber" })).toHaveLength(2);
    expect(fitProblems({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" })).toEqual([]);
  });
});
