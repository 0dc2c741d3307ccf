import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { allocate } from "@/lib/ledger/allocate";

describe("allocate (largest remainder)", () => {
  it("splits 10 seats 5 : 3 : 2 by votes 5000 : 3000 : 2000 exactly", () => {
    expect(allocate(10, [5000, 3000, 2000])).toEqual([5, 3, 2]);
  });

  it("gives leftover units to the largest remainders: 7 by 1 : 1 : 1 → 3, 2, 2", () => {
    // Hamilton's method: quotas 2⅓ each, one leftover goes to the first of the ties.
    expect(allocate(7, [1, 1, 1])).toEqual([3, 2, 2]);
  });

  it("always sums to the total with whole, non-negative parts within one of the quota", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000 }), fc.array(fc.integer({ min: 0, max: 1000 }), { minLength: 1, maxLength: 12 }), (total, weights) => {
        const parts = allocate(total, weights);
        const sum = weights.reduce((s, w) => s + w, 0);
        expect(parts.reduce((s, p) => s + p, 0)).toBe(total);
        parts.forEach((p, i) => {
          expect(Number.isInteger(p) && p >= 0).toBe(true);
          const quota = sum > 0 ? (total * weights[i]) / sum : total / weights.length;
          expect(Math.abs(p - quota)).toBeLessThan(1);
        });
      }),
    );
  });
});
