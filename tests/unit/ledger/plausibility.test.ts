import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/api/errors";
import { askUnlessConfirmed, BIN_OVERFILL_FACTOR, CALIBRATED_RANGE_FACTOR, checkHaul, checkSort, SORT_ESTIMATE_FACTOR } from "@/lib/ledger/plausibility";

// Thresholds: common practice, no published source (see lib/ledger/plausibility.ts).
describe("checkSort", () => {
  it("asks about 1,000,000 cans from a 1-bag haul estimated at 60", () => {
    const [u, ...rest] = checkSort({ counted: 1_000_000, estimated: 60, bags: 1, hauls: 1 });
    expect(rest).toEqual([]);
    expect(u).toMatchObject({ check: "sortVsEstimate", value: 1_000_000, expected: 60, factor: 3 });
    expect(u!.message).toBe("That is 1,000,000 cans from 1 bag (about 60 expected). Is that right?");
  });

  it("lets counts within a factor of 3 of the estimate through, and asks just beyond", () => {
    expect(SORT_ESTIMATE_FACTOR).toBe(3);
    expect(checkSort({ counted: 360, estimated: 120, bags: 2, hauls: 1 })).toEqual([]);
    expect(checkSort({ counted: 361, estimated: 120, bags: 2, hauls: 1 })).toHaveLength(1);
    expect(checkSort({ counted: 200, estimated: 600, bags: 10, hauls: 2 })).toEqual([]);
    expect(checkSort({ counted: 199, estimated: 600, bags: 10, hauls: 2 })[0]!.message).toBe("That is 199 cans from 10 bags (about 600 expected). Is that right?");
  });

  it("does not ask when the difference is under a bag's worth, whatever the ratio", () => {
    expect(checkSort({ counted: 40, estimated: 2, bags: 0, hauls: 1 })).toEqual([]);
    expect(checkSort({ counted: 70, estimated: 2, bags: 0, hauls: 1 })[0]!.message).toBe("That is 70 cans from 1 haul (about 2 expected). Is that right?");
  });
});

describe("checkHaul", () => {
  it("asks about more than 3× the bin's capacity", () => {
    expect(BIN_OVERFILL_FACTOR).toBe(3);
    expect(checkHaul({ bags: 18, capacityBags: 6, cansByWeight: null, cansPerBag: 60 })).toEqual([]);
    const [u] = checkHaul({ bags: 19, capacityBags: 6, cansByWeight: null, cansPerBag: 60 });
    expect(u).toMatchObject({ check: "binCapacity", value: 19, expected: 6 });
    expect(u!.message).toBe("That is 19 bags from a bin that holds 6 bags. Is that right?");
  });

  it("asks when the weight means far more (or fewer) cans per bag than the group's calibrated figure", () => {
    expect(CALIBRATED_RANGE_FACTOR).toBe(4);
    // 1 bag weighed at 50 kg ≈ 3,748 cans at 13.34 g a can, against about 60 a bag.
    const [u] = checkHaul({ bags: 1, capacityBags: 6, cansByWeight: 3748, cansPerBag: 60 });
    expect(u).toMatchObject({ check: "calibratedRange", expected: 60 });
    expect(u!.message).toBe("That weight is about 3,748 cans in 1 bag (about 60 expected). Is that right?");
    // A packed bag (2.5 kg ≈ 187 cans) is ordinary.
    expect(checkHaul({ bags: 1, capacityBags: 6, cansByWeight: 187, cansPerBag: 60 })).toEqual([]);
    // 10 bags weighing what 20 cans weigh.
    expect(checkHaul({ bags: 10, capacityBags: 6, cansByWeight: 20, cansPerBag: 60 })[0]!.check).toBe("calibratedRange");
    // Weight alone, no bags: nothing to compare with.
    expect(checkHaul({ bags: 0, capacityBags: 6, cansByWeight: 5000, cansPerBag: 60 })).toEqual([]);
  });
});

describe("askUnlessConfirmed", () => {
  const found = checkSort({ counted: 1_000_000, estimated: 60, bags: 1, hauls: 1 });

  it("throws a 409 that carries the question and how to confirm it", () => {
    let error: unknown;
    try {
      askUnlessConfirmed(found, undefined);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(AppError);
    const e = error as AppError;
    expect(e.status).toBe(409);
    expect(e.message).toBe(found[0]!.message);
    expect(e.details).toMatchObject({ confirm: "implausible", confirmField: "confirmUnusual", unusual: found });
  });

  it("lets a confirmed entry, or a plausible one, through", () => {
    expect(() => askUnlessConfirmed(found, true)).not.toThrow();
    expect(() => askUnlessConfirmed([], undefined)).not.toThrow();
    expect(() => askUnlessConfirmed(found, false)).toThrow(AppError);
  });
});
