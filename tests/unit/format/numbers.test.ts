import { describe, expect, it } from "vitest";
import { formatter } from "@/lib/format";
import { formatCount, formatNumber, formatPercent } from "@/lib/format/numbers";
import { lookInput } from "@/lib/format/schemas";

// CLDR number symbols, from memory: en-GB and en-US "," grouping and "." decimal; en-ZA a no-break
// space and ","; en-IN groups by lakh (12,34,567). English plurals per CLDR: "one" only for the
// integer 1, so 0, 1.5 and 2 take the plural form.
describe("numbers and counts", () => {
  it("writes numbers as the locale does", () => {
    expect(formatNumber(1234567.5, { locale: "en-GB" }, 1)).toBe("1,234,567.5");
    expect(formatNumber(1234567.5, { locale: "en-IN" }, 1)).toBe("12,34,567.5");
    expect(formatNumber(1234567.5, { locale: "en-ZA" }, 1)).toBe("1\u00a0234\u00a0567,5");
    expect(formatPercent(0.452, { locale: "en-GB" })).toBe("45%");
  });
  it("puts the right form of the noun after the number", () => {
    const gb = { locale: "en-GB" };
    expect(formatCount(1, "drop point", gb)).toBe("1 drop point");
    expect(formatCount(0, "can", gb)).toBe("0 cans");
    expect(formatCount(1.5, "bag", gb)).toBe("1.5 bags");
    expect(formatCount(1200, "can", gb)).toBe("1,200 cans");
    expect(formatCount(1200, "can", { locale: "en-ZA" })).toBe("1\u00a0200 cans");
  });
  it("binds every formatter to one look", () => {
    const f = formatter({ timeZone: "America/New_York", locale: "en-US", units: "imperial" });
    expect(f.day("2026-12-02")).toBe("Dec 2, 2026");
    expect(f.length(1165)).toBe("45⅞\u00a0in");
    expect(f.count(1, "stop")).toBe("1 stop");
  });
});

describe("the settings schema", () => {
  it("takes a real zone, an offered locale and metric or imperial", () => {
    expect(lookInput.safeParse({ timeZone: "Europe/Dublin", locale: "en-IE", units: "imperial" }).success).toBe(true);
    const bad = lookInput.safeParse({ timeZone: "Not/AZone", locale: "de-DE", units: "cubits" });
    expect(bad.success).toBe(false);
    const paths = bad.error!.issues.map((i) => i.path.join("."));
    expect(paths.sort()).toEqual(["locale", "timeZone", "units"]);
  });
});
