import { describe, expect, it } from "vitest";
import { codeToWords, entryLabel, kindLabel, moveLabel, reasonLabel, stageLabel } from "@/lib/ledger/labels";
import { KIND_LABEL, REASON_LABEL, STAGE_LABEL } from "@/lib/ledger/labels";
import { LINE_REASONS, MOVEMENT_KINDS, REJECT_REASONS, STAGES } from "@/lib/ledger/schemas";

describe("ledger labels", () => {
  it("has words for every stage and reason, never the raw camel-case code", () => {
    for (const s of STAGES) expect(stageLabel(s)).toMatch(/^[a-z ,]+$/);
    for (const r of REJECT_REASONS) expect(reasonLabel(r)).toMatch(/^[a-z ]+$/);
    expect(stageLabel("builtIn")).toBe("built in");
    expect(reasonLabel("wrongSize")).toBe("wrong size");
  });
  it("gives every stage, movement kind and line reason in the schemas its own entry", () => {
    for (const s of STAGES) expect(Object.hasOwn(STAGE_LABEL, s), s).toBe(true);
    for (const k of MOVEMENT_KINDS) expect(Object.hasOwn(KIND_LABEL, k), k).toBe(true);
    for (const r of LINE_REASONS) expect(Object.hasOwn(REASON_LABEL, r), r).toBe(true);
  });
  it("reads a code added later as words until it gets its own entry", () => {
    expect(codeToWords("damagedInPunching")).toBe("damaged in punching");
    expect(reasonLabel("damagedInOpening")).toBe("damaged in opening");
    expect(kindLabel("stockCount")).toBe("stock count");
  });
  it("writes a move without placeholder dots", () => {
    expect(moveLabel("good", "washed")).toBe("good → washed");
    expect(moveLabel(null, "hauled")).toBe("into hauled, not yet sorted");
    expect(moveLabel("claimed", null)).toBe("out of claimed for a unit");
    expect(moveLabel(null, "good")).not.toContain("·");
  });
  it("an undo names the line it undoes", () => {
    expect(entryLabel("reversal", "132")).toBe("undo of line 132");
    expect(entryLabel("haul", null)).toBe("haul");
  });
});
