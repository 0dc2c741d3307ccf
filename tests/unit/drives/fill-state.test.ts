import { describe, expect, it } from "vitest";
import { currentFill, fillShape, FILL_SHAPE_LABEL, timeAgo } from "@/lib/drives/fill";

const at = (h: number) => new Date(Date.UTC(2026, 10, 20, h));

describe("bin fill as state", () => {
  const reports = [{ level: 100, at: at(9) }, { level: 50, at: at(7) }];
  it("is the newest report when nothing happened since", () => {
    expect(currentFill(reports, null, null)).toEqual({ level: 100, reportedAt: at(9).toISOString() });
  });
  it("a haul after the report clears it; a report after the haul counts again", () => {
    expect(currentFill(reports, at(10), null)).toBeNull();
    expect(currentFill(reports, at(8), null)).toEqual({ level: 100, reportedAt: at(9).toISOString() });
  });
  it("an organiser's clear ends the episode like a haul", () => {
    expect(currentFill(reports, at(6), at(9.5))).toBeNull();
  });
  it("shows fill by shape as well as by word", () => {
    expect([null, 0, 25, 50, 75, 100].map(fillShape)).toEqual(["unknown", "empty", "part", "part", "full", "full"]);
    expect(new Set(Object.values(FILL_SHAPE_LABEL)).size).toBe(4);
  });
  it("says how long ago", () => {
    expect(timeAgo(at(9).toISOString(), at(12))).toBe("3 hours ago");
    expect(timeAgo(at(9).toISOString(), new Date(at(9).getTime() + 60_000))).toBe("1 minute ago");
  });
});
