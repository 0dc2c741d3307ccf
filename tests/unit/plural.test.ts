import { describe, expect, it } from "vitest";
import { countOf, noun, plural } from "@/lib/plural";

// English plural categories per CLDR (unicode.org/cldr, "Language Plural Rules"):
// "one" only for the integer 1 with no visible fraction; 0, 1.5 and 2 are "other".
describe("plural", () => {
  it.each([
    [0, "drop points"],
    [1, "drop point"],
    [2, "drop points"],
    [1.5, "drop points"],
    [-1, "drop point"],
  ])("%d → %s", (n, word) => {
    expect(plural(n, "drop point")).toBe(word);
  });

  it("takes an irregular plural", () => {
    expect(plural(1, noun("entry is", "entries are"))).toBe("entry is");
    expect(plural(3, noun("entry is", "entries are"))).toBe("entries are");
  });
});

describe("countOf", () => {
  it("puts the number before the right form", () => {
    expect(countOf(1, "drop point")).toBe("1 drop point");
    expect(countOf(2, "drop point")).toBe("2 drop points");
    expect(countOf(1, "bag")).toBe("1 bag");
    expect(countOf(0, "heater")).toBe("0 heaters");
    expect(countOf(1200, "can")).toBe("1,200 cans");
  });

  it("uses the caller's number format", () => {
    expect(countOf(1000000, "can", String)).toBe("1000000 cans");
  });
});
