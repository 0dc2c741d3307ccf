import { describe, expect, it } from "vitest";
import { dailySeries } from "@/lib/ledger/daily-series";

describe("the daily chart's series", () => {
  it("places every day at its real time and shows days without entries as zero", () => {
    const s = dailySeries([{ date: "2026-11-02", goodCans: 10 }, { date: "2026-11-06", goodCans: 5 }], "2026-11-01", "2026-11-07");
    expect(s.map((p) => p.date)).toEqual(["2026-11-01", "2026-11-02", "2026-11-03", "2026-11-04", "2026-11-05", "2026-11-06", "2026-11-07"]);
    expect(s.map((p) => p.goodCans)).toEqual([0, 10, 0, 0, 0, 5, 0]);
    expect(s.map((p) => p.cumulative)).toEqual([0, 10, 10, 10, 10, 15, 15]);
    // Equal spacing in time: one day apart, in ms since the epoch.
    expect(s[5].t - s[1].t).toBe(4 * 86_400_000);
    expect(s[0].t).toBe(Date.UTC(2026, 10, 1));
  });
  it("runs on to a later entry than the end asked for", () => {
    expect(dailySeries([{ date: "2026-11-04", goodCans: 1 }], "2026-11-01", "2026-11-02")).toHaveLength(4);
  });
});
