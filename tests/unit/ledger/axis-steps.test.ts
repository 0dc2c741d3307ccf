import { describe, expect, it } from "vitest";
import { axisSteps } from "@/components/ledger/ledger-charts";

// The good-cans chart's axis: steps of 1, 2 or 5 × 10ⁿ (the "1-2-5" series
// chart axes use; common practice, no published source), the smallest such
// step giving at most four intervals up to the top.
describe("axisSteps", () => {
  it("picks the smallest 1-2-5 step with at most four intervals", () => {
    expect(axisSteps(1050)).toEqual([0, 500, 1000]);
    expect(axisSteps(800)).toEqual([0, 200, 400, 600, 800]);
    expect(axisSteps(37)).toEqual([0, 10, 20, 30]);
    expect(axisSteps(3)).toEqual([0, 1, 2, 3]);
  });
  it("has a single zero step for an empty axis", () => {
    expect(axisSteps(0)).toEqual([0]);
  });
});

describe("axisSteps on a short axis", () => {
  it("steps by whole cans", () => {
    expect(axisSteps(2)).toEqual([0, 1, 2]);
  });
});
