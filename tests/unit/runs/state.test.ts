import { describe, expect, it } from "vitest";
import { stopProgress } from "@/lib/runs/state";

// The run's state rule lives in the database (pickup_run_follow_stops); the
// integration tests under tests/integration/runs check it through the API.
describe("stopProgress", () => {
  it("counts progress", () => {
    expect(stopProgress(["logged", "skipped", "pending", "logged"])).toEqual({ total: 4, logged: 2, skipped: 1, pending: 1 });
  });
});
