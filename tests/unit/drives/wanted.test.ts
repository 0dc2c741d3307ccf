import { describe, expect, it } from "vitest";
import { NOT_WANTED, WANTED } from "@/components/drives/public/wanted-cans";
import { wantedExtra } from "@/lib/drives/wanted";

// The drive page shows the standard lists and then the organiser's own text; a sentence
// that only repeats the lists is dropped. Plain reading of the lists, no published source.
const lists = [...WANTED, ...NOT_WANTED];

describe("wantedExtra", () => {
  it("drops the demo drive's sentence, which only repeats the standard list", () => {
    expect(wantedExtra("Standard 355 mL aluminium drink cans, empty, rinsed, undented and not crushed.", lists)).toBe("");
  });

  it("keeps a sentence that adds something, in the organiser's words, and drops the repeated one", () => {
    const text = "Rinsed, undented cans please. Bring them in any carrier bag; we return the bags at the library.";
    expect(wantedExtra(text, lists)).toBe("Bring them in any carrier bag; we return the bags at the library.");
  });

  it("keeps every line of a multi-line note that is new, and leaves an empty note empty", () => {
    expect(wantedExtra("Pet food tins go to the animal shelter instead\nNo cans after 6 pm", lists)).toBe(
      "Pet food tins go to the animal shelter instead No cans after 6 pm",
    );
    expect(wantedExtra("", lists)).toBe("");
  });
});
