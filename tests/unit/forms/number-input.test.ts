import { describe, expect, it } from "vitest";
import { NUMBER_SPECS, numberMessage, parseNumberInput, parseNumberInputs, stepNumberInput } from "@/lib/forms/number-input";

// The rule every count and weight box follows: exactly what was typed, or a
// message; never another number in its place. Inputs are the ones users hit
// (common practice, no published source).
const bags = NUMBER_SPECS.haulBags;
const kg = NUMBER_SPECS.haulWeightKg;
const BAGS_MESSAGE = "Enter a whole number of bags, like 3.";
const KG_MESSAGE = "Enter a weight in kg, like 4.5.";

describe("a whole-number box (bags)", () => {
  it.each([
    ["3", 3],
    [" 3 ", 3],
    ["\u00a03\u00a0", 3], // no-break spaces a paste can bring
    ["007", 7],
    ["0", 0],
    ["500", 500],
  ])("takes %j as %i", (raw, value) => {
    expect(parseNumberInput(raw, bags)).toEqual({ ok: true, value });
  });

  it.each([
    ["\u22124", "Unicode minus"],
    ["-4", "hyphen minus"],
    ["+4", "plus sign"],
    ["2.5", "fraction with a point"],
    ["2,5", "fraction with a comma"],
    ["abc", "letters"],
    ["3 bags", "a number with letters"],
    ["3e2", "exponent"],
    ["0x10", "hex"],
    ["1 000", "a space inside"],
    ["", "empty, and the box is required"],
    ["   ", "only spaces"],
  ])("refuses %j (%s) with the one message", (raw) => {
    expect(parseNumberInput(raw, bags)).toEqual({ ok: false, error: BAGS_MESSAGE });
  });

  it("refuses more than the box allows, saying the limit", () => {
    expect(parseNumberInput("501", bags)).toEqual({ ok: false, error: "Enter no more than 500 bags." });
    expect(parseNumberInput("99999999999999999999999", bags)).toEqual({ ok: false, error: "Enter no more than 500 bags." });
  });

  it("refuses a huge number beyond exact integers even with no limit", () => {
    const noLimit = { ...bags, max: undefined };
    expect(parseNumberInput("9007199254740993", noLimit)).toEqual({ ok: false, error: BAGS_MESSAGE });
    expect(parseNumberInput("9007199254740991", noLimit)).toEqual({ ok: true, value: 9007199254740991 });
  });

  it("says the minimum in words, singular for one", () => {
    expect(parseNumberInput("0", NUMBER_SPECS.batchCans)).toEqual({ ok: false, error: "Enter at least 1 can." });
    expect(parseNumberInput("0", NUMBER_SPECS.capacityBags)).toEqual({ ok: false, error: "Enter at least 1 bag." });
  });

  it("lets an optional box stay empty (null), never 0", () => {
    expect(parseNumberInput("", NUMBER_SPECS.countedCans)).toEqual({ ok: true, value: null });
  });
});

describe("a decimal box (weight in kg)", () => {
  it.each([
    ["4.5", 4.5],
    ["4,5", 4.5],
    [",5", 0.5],
    [" 12 ", 12],
    ["0", 0],
    ["5000", 5000],
  ])("takes %j as %d", (raw, value) => {
    expect(parseNumberInput(raw, kg)).toEqual({ ok: true, value });
  });

  it.each(["\u22124", "-4", "abc", "4.5.1", "4,500.25", "4.", "1e3", "Infinity", "NaN"])("refuses %j", (raw) => {
    expect(parseNumberInput(raw, kg)).toEqual({ ok: false, error: KG_MESSAGE });
  });

  it("asks about \"1,234\" instead of reading it as 1.234 or 1234", () => {
    const p = parseNumberInput("1,234", { ...kg, max: undefined });
    expect(p.ok).toBe(false);
    expect(p.ok ? "" : p.error).toMatch(/1234 or 1\.234/);
    expect(parseNumberInput("1,23", kg)).toEqual({ ok: true, value: 1.23 });
    expect(parseNumberInput("0,250", kg)).toEqual({ ok: true, value: 0.25 });
  });

  it("is optional: empty is no weight", () => {
    expect(parseNumberInput("", kg)).toEqual({ ok: true, value: null });
  });

  it("says the limit with its unit", () => {
    expect(parseNumberInput("5000.5", kg)).toEqual({ ok: false, error: "Enter no more than 5,000 kg." });
  });
});

describe("the same message everywhere", () => {
  it("names what is counted", () => {
    expect(numberMessage(NUMBER_SPECS.goodCans)).toBe("Enter a whole number of cans, like 3.");
    expect(numberMessage(NUMBER_SPECS.stopBags)).toBe(numberMessage(NUMBER_SPECS.haulBags));
    expect(numberMessage(NUMBER_SPECS.recycledWeightKg)).toBe(KG_MESSAGE);
  });
});

describe("parseNumberInputs", () => {
  it("gives values and errors by field", () => {
    expect(parseNumberInputs({ bags: ["2.5", bags], weightKg: ["4,5", kg] })).toEqual({ values: { bags: null, weightKg: 4.5 }, errors: { bags: BAGS_MESSAGE } });
    expect(parseNumberInputs({ bags: ["2", bags], weightKg: ["", kg] })).toEqual({ values: { bags: 2, weightKg: null }, errors: {} });
  });
});

describe("stepNumberInput (the − and + buttons)", () => {
  it("steps from what is typed, not below 0 or the minimum, not past the maximum", () => {
    expect(stepNumberInput("3", bags, 1)).toBe("4");
    expect(stepNumberInput("", bags, 1)).toBe("1");
    expect(stepNumberInput("0", bags, -1)).toBe("0");
    expect(stepNumberInput("500", bags, 1)).toBe("500");
    expect(stepNumberInput("0", NUMBER_SPECS.batchCans, -1)).toBe("1");
  });

  it("does not guess a number from what is not one", () => {
    expect(stepNumberInput("\u22124", bags, 1)).toBeNull();
    expect(stepNumberInput("2.5", bags, 1)).toBeNull();
    expect(stepNumberInput("abc", bags, -1)).toBeNull();
  });
});
