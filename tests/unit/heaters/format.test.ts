import { describe, expect, it } from "vitest";
import { formatAperture, formatRunLength } from "@/lib/heaters/format";

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

// 1 m = 1,000 mm (SI, BIPM SI Brochure 9th ed.); 1 ft = 12 in (NIST SP 811 appendix B).
describe("formatRunLength", () => {
  it("gives a long metric run in metres to 0.1", () => {
    expect(formatRunLength(23_456, "mm")).toBe(nb("23.5 m"));
  });
  it("keeps a short metric run in whole millimetres", () => {
    expect(formatRunLength(640.4, "mm")).toBe(nb("640 mm"));
  });
  it("gives a long inch run in feet to 0.1", () => {
    // 1,167.34 in ÷ 12 = 97.28 ft
    expect(formatRunLength(1_167.34, "in")).toBe(nb("97.3 ft"));
  });
  it("keeps a short inch run to the nearest eighth", () => {
    expect(formatRunLength(30.3, "in")).toBe(nb("30¼ in"));
  });
});
