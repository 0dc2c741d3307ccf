import { describe, expect, it } from "vitest";
import { DEFAULT_YIELD, addDays, countGoodCans, driveProgress, driveTarget, heatersCovered, observedYield, paceCansPerDay } from "@/lib/drives/progress";
import { example, noStages } from "./progress-example";

// `example` is the drive worked by hand in progress-example.ts.
describe("driveProgress", () => {
  it("matches the worked example", () => {
    expect(driveProgress(example)).toEqual({
      target: { heaterCans: 440, spare: 22, cans: 462, heaters: 3 },
      goodCans: 250,
      yield: 250 / 300,
      yieldSource: "observed",
      estimatedUnsorted: 100,
      remaining: 212,
      heatersCovered: { covered: 2, total: 3 },
      pace: { cansPerDay: 10, windowDays: 14 },
      expectedFinish: "2025-04-06",
      finish: { kind: "expected", date: "2025-04-06", afterEnd: false },
    });
  });

  it("uses the stated default yield before any sort", () => {
    // No sorted cans: yield is the default 0.8, so 300 hauled → 240 likely good.
    const p = driveProgress({ ...example, stages: noStages, rejectedCans: 0, hauledEstimate: 300 });
    expect(DEFAULT_YIELD).toBe(0.8);
    expect(p.yield).toBe(0.8);
    expect(p.yieldSource).toBe("default");
    expect(p.estimatedUnsorted).toBe(240);
    expect(p.remaining).toBe(462);
    expect(p.heatersCovered).toEqual({ covered: 0, total: 3 });
  });

  it("has no finish date when the pace is zero", () => {
    const p = driveProgress({ ...example, daily: [] });
    expect(p.pace.cansPerDay).toBe(0);
    expect(p.expectedFinish).toBeNull();
  });

  it("has reached its target once nothing remains, with no finish date to promise", () => {
    const p = driveProgress({ ...example, stages: { ...noStages, good: 500 }, daily: [] });
    expect(p.remaining).toBe(0);
    expect(p.finish).toEqual({ kind: "reached" });
    expect(p.expectedFinish).toBeNull();
    expect(p.heatersCovered).toEqual({ covered: 3, total: 3 });
  });

  it("has no target, and so no finish, for a drive with no heaters", () => {
    const p = driveProgress({ ...example, unitCans: [] });
    expect(p.target).toEqual({ heaterCans: 0, spare: 0, cans: 0, heaters: 0 });
    expect(p.remaining).toBe(0);
    expect(p.finish).toEqual({ kind: "noTarget" });
    expect(p.expectedFinish).toBeNull();
  });
});

describe("driveTarget spare rounding", () => {
  it.each([
    // [unit cans, expected spare]: 5 % rounded up, by hand
    [[300], 15], // 15 exactly: float noise must not make it 16
    [[301], 16], // 15.05 → 16
    [[20], 1], // 1 exactly
    [[1], 1], // 0.05 → 1
    [[140, 140, 140], 21], // 420 × 5 % = 21 exactly
    [[], 0],
  ])("%j → spare %i", (units, spare) => {
    expect(driveTarget(units).spare).toBe(spare);
  });

  it("takes another percentage and rejects negatives", () => {
    // 7 % of 100 = 7.000000000000001 in floats; still 7.
    expect(driveTarget([100], 7).spare).toBe(7);
    expect(driveTarget([100], 0).cans).toBe(100);
    expect(() => driveTarget([-1])).toThrow(RangeError);
  });
});

describe("pieces", () => {
  it("counts good cans across every stage from good onward", () => {
    expect(countGoodCans({ good: 1, washed: 2, opened: 3, punched: 4, claimed: 5, builtIn: 6 })).toBe(21);
  });

  it("computes yield from counted cans only", () => {
    expect(observedYield(90, 10)).toEqual({ value: 0.9, source: "observed" });
    expect(observedYield(0, 10)).toEqual({ value: 0, source: "observed" });
    expect(observedYield(0, 0, 0.7)).toEqual({ value: 0.7, source: "default" });
  });

  it("covers heaters in order and stops at the first one short", () => {
    // 100 good: unit 1 (60) yes, 40 left; unit 2 (50) no; unit 3 (10) not counted after a gap.
    expect(heatersCovered([60, 50, 10], 100)).toBe(1);
    expect(heatersCovered([60, 40], 100)).toBe(2);
    expect(heatersCovered([], 100)).toBe(0);
  });

  it("does not charge a young drive for days before it started", () => {
    // Started 11 March, today 15 March: 5 days, 50 cans → 10 a day (not 50/14).
    const daily = [{ date: "2025-03-12", goodCans: 50 }];
    expect(paceCansPerDay(daily, "2025-03-15", 14, "2025-03-11")).toEqual({ cansPerDay: 10, windowDays: 5 });
    expect(paceCansPerDay(daily, "2025-03-15", 14, "2025-03-20")).toEqual({ cansPerDay: 0, windowDays: 0 });
  });

  it("never reports a negative pace after reversals", () => {
    expect(paceCansPerDay([{ date: "2025-03-14", goodCans: -30 }], "2025-03-15").cansPerDay).toBe(0);
  });

  it("adds calendar days across month, leap-day and year ends", () => {
    // Gregorian calendar: 2024 is a leap year, 2025 is not.
    expect(addDays("2024-02-28", 1)).toBe("2024-02-29");
    expect(addDays("2025-02-28", 1)).toBe("2025-03-01");
    expect(addDays("2024-12-31", 1)).toBe("2025-01-01");
    expect(() => addDays("15/03/2025", 1)).toThrow(RangeError);
  });
});
