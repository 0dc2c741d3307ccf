import { describe, expect, it } from "vitest";
import { formatAperture } from "@/lib/heaters/format";

const nb = (s: string) => s.replace(/ /g, "\u00a0");

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959; NIST SP 811 appendix B),
// so 1 in² = 645.16 mm².
describe("formatAperture", () => {
  it("gives a metric plan's aperture in square metres to 0.01, not seven-digit mm²", () => {
    expect(formatAperture(762 * 1395, "mm")).toBe(nb("1.06 m²"));
  });
  it("gives an inch plan's aperture in in² with m² beside it", () => {
    // 30 in × 54.9 in = 1,647 in² = 1,647 × 645.16 mm² ≈ 1.06 m²
    expect(formatAperture(30 * 54.9, "in")).toBe(`${nb("1,647 in²")} (${nb("1.06 m²")})`);
  });
});
