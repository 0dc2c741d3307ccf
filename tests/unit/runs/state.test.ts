import { describe, expect, it } from "vitest";
import { runStateOf, stopProgress } from "@/lib/runs/state";

// The product rule: a run is done when every stop is logged or skipped.
describe("runStateOf", () => {
  it("is planned while every stop is pending", () => {
    expect(runStateOf(["pending", "pending"])).toBe("planned");
  });
  it("is under way once any stop is logged or skipped", () => {
    expect(runStateOf(["logged", "pending"])).toBe("under_way");
    expect(runStateOf(["pending", "skipped", "pending"])).toBe("under_way");
  });
  it("is done when none is pending, whatever the mix", () => {
    expect(runStateOf(["logged", "skipped", "logged"])).toBe("done");
    expect(runStateOf(["skipped"])).toBe("done");
  });
  it("counts progress", () => {
    expect(stopProgress(["logged", "skipped", "pending", "logged"])).toEqual({ total: 4, logged: 2, skipped: 1, pending: 1 });
  });
});
