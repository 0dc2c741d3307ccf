import { z } from "zod";
import { day, moment } from "@/lib/dates";
import { DEFAULT_GRAMS_PER_CAN } from "./estimate";

// Inputs of the ledger endpoints; shared by the forms and the handlers. Safe to import in the
// client, but it brings zod: a form loads it when it is sent (lib/forms/lazy-schemas.ts).
import { LOSS_REASONS, LOSS_STEP, PROCESS_FROM, PROCESS_TO, REJECT_REASONS, STAGES, type TallyReason } from "./codes";
export * from "./codes";

const MAX_CANS = 1_000_000;
const wholeCans = (label: string) =>
  z.number({ error: `Enter the number of ${label}.` }).int(`Whole ${label} only.`).min(0, `${label} can't be negative.`).max(MAX_CANS, `That is more ${label} than one entry can hold.`);
const positiveCans = (label: string) => wholeCans(label).min(1, `At least 1 ${label.replace(/s$/, "")}.`);
const when = moment("Use a date and time like 2026-12-02T09:30:00Z.").optional();
/** When it happened, as the entering phone says (an offline entry is sent later); checked against the drive and the clock. */
const happenedAt = when;
/** Sent again after the server asked about an unusual number (409, confirm "implausible"): "yes, that is right". */
const confirmUnusual = z.boolean({ error: "Send true to confirm an unusual entry." }).optional();
const note = z.string().trim().max(500, "Keep the note under 500 characters.").optional();

/**
 * A weighed haul lighter than one empty can would be estimated at no cans (and
 * under a gram it is stored as 0 kg, which the hauls table refuses). 0 kg stays
 * a reading: with bags it says "weighed, empty".
 */
export const MIN_HAUL_WEIGHT_KG = DEFAULT_GRAMS_PER_CAN / 1000;
export const UNDER_ONE_CAN = "That weight is under one can; enter the bag count instead or weigh again.";
const haulWeight = z
  .number({ error: "Enter the weight in kg." })
  .min(0, "Weight can't be negative.")
  .max(5_000, "That is more than one pickup weighs.")
  .refine((kg) => kg === 0 || kg >= MIN_HAUL_WEIGHT_KG, { error: UNDER_ONE_CAN, when: (payload) => payload.issues.length === 0 });

export const haulInputSchema = z
  .object({
    dropPointId: z.uuid("Choose a drop point."),
    bags: wholeCans("bags").max(500, "That is more bags than one pickup holds."),
    weightKg: haulWeight.nullable().optional(),
    hauledAt: when,
    happenedAt,
    confirmUnusual,
    note,
  })
  .refine((v) => v.bags > 0 || (v.weightKg ?? 0) > 0, { path: ["bags"], message: "Enter the bags, the weight, or both." });
export type HaulInput = z.infer<typeof haulInputSchema>;

export const rejectedCountsSchema = z.partialRecord(z.enum(REJECT_REASONS), wholeCans("cans"));

export const sortInputSchema = z
  .object({
    haulIds: z.array(z.uuid("Choose the hauls this sort counted.")).min(1, "Choose at least one haul.").max(100),
    good: wholeCans("good cans"),
    rejected: rejectedCountsSchema.default({}),
    sortedAt: when,
    happenedAt,
    confirmUnusual,
    note,
  })
  .refine((v) => new Set(v.haulIds).size === v.haulIds.length, { path: ["haulIds"], message: "A haul is listed twice." })
  .refine((v) => v.good + Object.values(v.rejected).reduce<number>((s, n) => s + (n ?? 0), 0) > 0, {
    path: ["good"],
    message: "A sort counts at least one can.",
  });
export type SortInput = z.infer<typeof sortInputSchema>;

export const lossInputSchema = z.object({
  reason: z.enum(LOSS_REASONS, { error: "Choose how the cans were lost." }),
  quantity: positiveCans("lost cans"),
});

export const processingInputSchema = z
  .object({
    from: z.enum(PROCESS_FROM, { error: "Choose the stage the cans come from." }),
    to: z.enum(PROCESS_TO, { error: "Choose the stage the cans go to." }),
    // 0 only when the whole batch was lost (then `lost` says how many).
    quantity: wholeCans("cans"),
    /** Cans lost on the way: they leave `from` for `rejected` in the same movement. */
    lost: lossInputSchema.optional(),
    occurredAt: when,
    happenedAt,
    note,
  })
  .refine((v) => PROCESS_FROM.indexOf(v.from) < PROCESS_TO.indexOf(v.to) + 1, {
    path: ["to"],
    message: "Cans only move forward: good → washed → opened → punched.",
  })
  .refine((v) => v.quantity > 0 || v.lost !== undefined, { path: ["quantity"], message: "At least 1 can." })
  .refine((v) => !v.lost || PROCESS_TO.indexOf(LOSS_STEP[v.lost.reason]) <= PROCESS_TO.indexOf(v.to), {
    path: ["lost", "reason"],
    message: "This step stops before that one: choose where the cans were really damaged.",
  })
  .refine((v) => v.quantity + (v.lost?.quantity ?? 0) <= MAX_CANS, { path: ["lost", "quantity"], message: "That is more cans than one entry can hold." });
export type ProcessingInput = z.infer<typeof processingInputSchema>;

export const claimInputSchema = z.object({ quantity: positiveCans("cans"), note });
export type ClaimInput = z.infer<typeof claimInputSchema>;

export const recyclingInputSchema = z.object({
  quantity: positiveCans("cans"),
  weightKg: z.number().min(0).max(5_000).nullable().optional(),
  moneyReceived: z.number().min(0).max(1_000_000).nullable().optional(),
  occurredAt: when,
  note,
});
export type RecyclingInput = z.infer<typeof recyclingInputSchema>;

export const ledgerFilterSchema = z.object({
  driveId: z.uuid().optional(),
  dropPointId: z.uuid().optional(),
  stage: z.enum(STAGES).optional(),
  personId: z.uuid().optional(),
  from: day("Use a date like 2026-11-01.").optional(),
  to: day("Use a date like 2026-11-01.").optional(),
  mine: z.enum(["1"]).optional(),
  limit: z.coerce.number().int().min(1).max(1000).optional(),
});
export type LedgerFilter = z.infer<typeof ledgerFilterSchema>;

/** The stock shape of GET /api/drives/{id}/stock. */
export interface DriveStock {
  stages: { hauled: number; good: number; washed: number; opened: number; punched: number; builtIn: number; recycled: number };
  /** Rejects by reason: a sort's reasons and processing losses' (LOSS_REASONS), both counted. */
  rejected: Record<TallyReason, number>;
  /** Rejected cans counted but not yet taken to recycling. */
  rejectedOnHand: number;
  claimed: number;
  unclaimed: number;
}

/** POST /api/movements/{id}/reversal: the body is optional; a reason is kept with the undo. */
export const reversalInputSchema = z.object({
  reason: z.string().trim().max(300, "Keep the reason under 300 characters.").optional(),
});
export type ReversalInput = z.infer<typeof reversalInputSchema>;
