import { describe, expect, it } from "vitest";
import { parseNumberInput } from "@/lib/forms/number-input";
import { weightEntry } from "@/lib/format/weight-entry";

// 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959; NIST SP 811 appendix B).
describe("typing a weight in the group's units", () => {
  it("an imperial group types pounds; the API gets kilograms", () => {
    const w = weightEntry("imperial");
    expect(w.unit).toBe("lb");
    expect(w.toKg(10)).toBe(4.536); // 4.5359237 kg, to the gram
    expect(w.toKg(null)).toBeNull();
    // The box's own ceiling is the API's 5,000 kg in pounds (11,023 lb).
    expect(w.spec.max).toBe(11_023);
  });
  it("a metric group types kilograms, passed on as typed", () => {
    const w = weightEntry("metric");
    expect(w.unit).toBe("kg");
    expect(w.toKg(4.5)).toBe(4.5);
  });
  it("a pound box refuses words in pounds, not kilograms", () => {
    const r = parseNumberInput("abc", weightEntry("imperial").spec);
    expect(r.ok).toBe(false);
    expect(r.ok ? "" : r.error).toBe("Enter a weight in lb, like 4.5.");
  });
});
