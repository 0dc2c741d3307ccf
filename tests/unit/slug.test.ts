import { describe, expect, it } from "vitest";
import { toSlug } from "@/lib/slug";

// Accents come off by Unicode canonical decomposition (NFKD, Unicode Standard
// Annex #15): "é" is "e" + U+0301, and the combining mark is dropped, not turned into a hyphen.
describe("toSlug", () => {
  it("keeps the letter under an accent", () => {
    expect(toSlug("Résumé Hall", 80)).toBe("resume-hall");
    expect(toSlug("Ångström Road 5", 80)).toBe("angstrom-road-5");
  });
  it("joins words with single hyphens and trims them at both ends and at the limit", () => {
    expect(toSlug("  Winter -- drive!  ", 80)).toBe("winter-drive");
    expect(toSlug("abcdef ghij", 6)).toBe("abcdef");
  });
});
