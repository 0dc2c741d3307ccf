import { describe, expect, it } from "vitest";
import { processingInputSchema, TALLY_REASONS, REJECT_REASONS } from "@/lib/ledger/schemas";
import { countDifferences, stockCountInputSchema } from "@/lib/ledger/stock-count-schema";
import { lossReasonsFor, ownLossReason } from "@/components/ledger/loss-fields";

// The shared input rules of processing losses and stock counts (PRODUCT.md "Loss", "Stock count").
describe("processing with a loss", () => {
  it("accepts the contract's body unchanged, and a loss beside it", () => {
    expect(processingInputSchema.safeParse({ from: "good", to: "washed", quantity: 5 }).success).toBe(true);
    const withLoss = processingInputSchema.safeParse({ from: "washed", to: "opened", quantity: 40, lost: { reason: "damagedOpening", quantity: 2 } });
    expect(withLoss.success && withLoss.data.lost).toEqual({ reason: "damagedOpening", quantity: 2 });
  });

  it("allows a batch lost whole (0 moved) only with a loss", () => {
    expect(processingInputSchema.safeParse({ from: "good", to: "washed", quantity: 0 }).success).toBe(false);
    expect(processingInputSchema.safeParse({ from: "good", to: "washed", quantity: 0, lost: { reason: "damagedWashing", quantity: 3 } }).success).toBe(true);
  });

  it("refuses a loss in a step the batch never reached, a sort's reason, and a loss of 0", () => {
    const early = processingInputSchema.safeParse({ from: "good", to: "opened", quantity: 5, lost: { reason: "damagedPunching", quantity: 1 } });
    expect(early.success).toBe(false);
    expect(early.error?.issues[0].path).toEqual(["lost", "reason"]);
    expect(processingInputSchema.safeParse({ from: "good", to: "washed", quantity: 5, lost: { reason: "dented", quantity: 1 } }).success).toBe(false);
    expect(processingInputSchema.safeParse({ from: "good", to: "washed", quantity: 5, lost: { reason: "damagedWashing", quantity: 0 } }).success).toBe(false);
  });

  it("offers each step its own reason first and never a later step's", () => {
    expect(lossReasonsFor("washed")).toEqual(["damagedWashing"]);
    expect(lossReasonsFor("opened")).toEqual(["damagedWashing", "damagedOpening"]);
    expect(lossReasonsFor("punched")).toEqual(["damagedWashing", "damagedOpening", "damagedPunching"]);
    expect(ownLossReason("punched")).toBe("damagedPunching");
  });

  it("keeps the contract's reject reasons and adds the loss reasons to the tallies", () => {
    expect(TALLY_REASONS.slice(0, REJECT_REASONS.length)).toEqual(["dented", "crushed", "wrongSize", "notAluminium", "damaged", "other"]);
    expect(TALLY_REASONS).toContain("damagedOpening");
  });
});

describe("stock count input", () => {
  const ok = { counted: { good: 90 }, expected: { good: 100 }, reason: "Shelf recount" };
  it("needs a reason, a counted stage, and the total seen for each counted stage", () => {
    expect(stockCountInputSchema.safeParse(ok).success).toBe(true);
    expect(stockCountInputSchema.safeParse({ ...ok, reason: "  " }).success).toBe(false);
    expect(stockCountInputSchema.safeParse({ ...ok, counted: {} }).success).toBe(false);
    expect(stockCountInputSchema.safeParse({ ...ok, expected: {} }).success).toBe(false);
  });

  it("counts only stages where cans physically sit", () => {
    for (const stage of ["hauled", "claimed", "builtIn", "recycled"]) {
      expect(stockCountInputSchema.safeParse({ counted: { [stage]: 1 }, expected: { [stage]: 0 }, reason: "Recount" }).success, stage).toBe(false);
    }
    expect(stockCountInputSchema.safeParse({ counted: { rejected: 1 }, expected: { rejected: 0 }, reason: "Recount" }).success).toBe(true);
  });

  it("takes each counted stage's difference from its total, leaving out matches, in stage order", () => {
    expect(countDifferences({ punched: 10, good: 95, washed: 40 }, { good: 100, washed: 40, punched: 7 })).toEqual([
      { stage: "good", expected: 100, counted: 95, difference: -5 },
      { stage: "punched", expected: 7, counted: 10, difference: 3 },
    ]);
    expect(countDifferences({ opened: 4 }, {})).toEqual([{ stage: "opened", expected: 0, counted: 4, difference: 4 }]);
  });
});
