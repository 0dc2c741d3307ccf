import { describe, expect, it } from "vitest";
import { assessPoint, bagsPerDay, rankSuggestions, type PointActivity } from "@/lib/runs/suggest";

const day = (n: number) => new Date(Date.UTC(2026, 11, 1) + n * 86_400_000);
const now = day(0);

// Expected values are worked by hand from the rule "each haul after the first
// empties what gathered since the one before" (product rule, no published source).
describe("bagsPerDay", () => {
  it("needs two hauls", () => {
    expect(bagsPerDay([])).toBeNull();
    expect(bagsPerDay([{ at: day(-3), bags: 4 }])).toBeNull();
  });
  it("divides the later hauls' bags by the days they span", () => {
    // Hauls on days −20, −13, −6 with 9, 3, 4 bags: (3 + 4) bags over 14 days = 0.5 bag/day.
    expect(bagsPerDay([{ at: day(-6), bags: 4 }, { at: day(-20), bags: 9 }, { at: day(-13), bags: 3 }])).toBeCloseTo(0.5, 12);
  });
  it("uses only the five most recent hauls", () => {
    const hauls = [0, 1, 2, 3, 4, 5].map((i) => ({ at: day(-10 - i * 2), bags: i === 5 ? 1000 : 2 }));
    // Newest five span days −10 to −18 (8 days); the four later hauls hold 8 bags: 1 bag/day.
    expect(bagsPerDay(hauls)).toBeCloseTo(1, 12);
  });
});

describe("assessPoint", () => {
  it("expects fill from pace × days since the last haul over capacity", () => {
    const s = assessPoint({ id: "p", capacityBags: 4, hauls: [{ at: day(-14), bags: 1 }, { at: day(-6), bags: 4 }] }, now);
    // 4 bags over 8 days = 0.5/day; 6 days since → 3 bags of 4 = 0.75.
    expect(s.bagsPerDay).toBeCloseTo(0.5, 12);
    expect(s.daysSinceHaul).toBeCloseTo(6, 12);
    expect(s.expectedFill).toBeCloseTo(0.75, 12);
    expect(s.suggested).toBe(true);
  });
  it("ignores a fill report older than the last haul", () => {
    const s = assessPoint(
      { id: "p", capacityBags: 6, hauls: [{ at: day(-2), bags: 3 }], latestFillReport: { fraction: 1, at: day(-3) } },
      now,
    );
    expect(s.reportedFill).toBeNull();
    expect(s.reportedFull).toBe(false);
  });
  it("counts a report of exactly three-quarters as full", () => {
    const s = assessPoint({ id: "p", capacityBags: 6, hauls: [{ at: day(-5), bags: 3 }], latestFillReport: { fraction: 0.75, at: day(-1) } }, now);
    expect(s.reportedFull).toBe(true);
  });
});

describe("rankSuggestions", () => {
  it("puts reported-full bins first, then the longest since a haul (never hauled first)", () => {
    const points: PointActivity[] = [
      { id: "recent", capacityBags: 6, hauls: [{ at: day(-1), bags: 2 }] },
      { id: "old", capacityBags: 6, hauls: [{ at: day(-12), bags: 2 }] },
      { id: "never", capacityBags: 6, hauls: [] },
      { id: "half", capacityBags: 6, hauls: [{ at: day(-20), bags: 2 }], latestFillReport: { fraction: 0.5, at: day(-1) } },
      { id: "full", capacityBags: 6, hauls: [{ at: day(-2), bags: 2 }], latestFillReport: { fraction: 0.9, at: day(-1) } },
      { id: "fuller", capacityBags: 6, hauls: [], latestFillReport: { fraction: 1, at: day(-1) } },
    ];
    expect(rankSuggestions(points, now).map((s) => s.id)).toEqual(["fuller", "full", "never", "half", "old", "recent"]);
  });
});
