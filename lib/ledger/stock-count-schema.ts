import { z } from "zod";

// The stock count's input, shared by the organiser's form and the handler. Safe to import in the client.
//
// Countable: the stages where cans physically sit and can be counted. Not
// `hauled` (an estimate until a sort counts it), `claimed` (a reservation, not
// a place), `builtIn` (inside a wall) or `recycled` (gone).
export const COUNTABLE_STAGES = ["good", "washed", "opened", "punched", "rejected"] as const;
export type CountableStage = (typeof COUNTABLE_STAGES)[number];

export const COUNTABLE_LABEL: Record<CountableStage, string> = {
  good: "Good, not washed",
  washed: "Washed",
  opened: "Opened",
  punched: "Punched",
  rejected: "Rejected, waiting for recycling",
};

const MAX_CANS = 1_000_000;
const cans = z
  .number({ error: "Enter the number of cans." })
  .int("Whole cans only.")
  .min(0, "Cans can't be negative.")
  .max(MAX_CANS, "That is more cans than one count can hold.");
const perStage = z.partialRecord(z.enum(COUNTABLE_STAGES), cans);

export const stockCountInputSchema = z
  .object({
    /** What is physically on hand, per counted stage (stages left out are not counted). */
    counted: perStage,
    /** The running totals the person saw beside each box; the count is refused if they moved since. */
    expected: perStage,
    reason: z.string({ error: "Say why the count differs." }).trim().min(3, "Say why the count differs (at least 3 characters).").max(500, "Keep the reason under 500 characters."),
  })
  .refine((v) => Object.keys(v.counted).length > 0, { path: ["counted"], message: "Count at least one stage." })
  .refine((v) => Object.keys(v.counted).every((s) => s in v.expected), { path: ["expected"], message: "Send the running total you saw for every counted stage." });
export type StockCountInput = z.infer<typeof stockCountInputSchema>;

export interface StockCountLine {
  stage: CountableStage;
  expected: number;
  counted: number;
  /** counted − expected: positive when more cans were found than the ledger held. */
  difference: number;
}

/** The differences a count makes, in COUNTABLE_STAGES order, leaving out the stages that match. Pure. */
export function countDifferences(counted: Partial<Record<CountableStage, number>>, totals: Partial<Record<CountableStage, number>>): StockCountLine[] {
  return COUNTABLE_STAGES.filter((s) => counted[s] !== undefined)
    .map((stage) => ({ stage, expected: totals[stage] ?? 0, counted: counted[stage]!, difference: counted[stage]! - (totals[stage] ?? 0) }))
    .filter((l) => l.difference !== 0);
}
