import { describe, expect, it } from "vitest";
import { ALERT_LEVEL, shouldAlert } from "@/lib/drives/fill";

const t = (iso: string) => new Date(iso);

describe("bin fill alerts", () => {
  it("alerts on the first report at or above three quarters", () => {
    expect(ALERT_LEVEL).toBe(75);
    expect(shouldAlert(50, null, null)).toBe(false);
    expect(shouldAlert(75, null, null)).toBe(true);
    expect(shouldAlert(100, null, t("2026-11-20T10:00:00Z"))).toBe(true);
  });

  it("stays quiet for the rest of the episode", () => {
    expect(shouldAlert(100, t("2026-11-21T09:00:00Z"), null)).toBe(false);
    expect(shouldAlert(100, t("2026-11-21T09:00:00Z"), t("2026-11-20T10:00:00Z"))).toBe(false);
  });

  it("alerts again once a haul has ended the episode", () => {
    expect(shouldAlert(75, t("2026-11-21T09:00:00Z"), t("2026-11-22T16:30:00Z"))).toBe(true);
    expect(shouldAlert(50, t("2026-11-21T09:00:00Z"), t("2026-11-22T16:30:00Z"))).toBe(false);
  });
});
