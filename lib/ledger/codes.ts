// The ledger's codes and their words: stages, reasons, movement kinds and the
// processing steps. No zod here, so a page that only shows or picks a code does
// not ship the validator (lib/ledger/schemas.ts re-exports all of it).
export const REJECT_REASONS = ["dented", "crushed", "wrongSize", "notAluminium", "damaged", "other"] as const;
export type RejectReason = (typeof REJECT_REASONS)[number];

export const REJECT_REASON_LABEL: Record<RejectReason, string> = {
  dented: "Dented",
  crushed: "Crushed",
  wrongSize: "Wrong size",
  notAluminium: "Not aluminium",
  damaged: "Torn or dirty",
  other: "Other",
};

/** Why cans were lost on the way through processing; each names the step it happened in (PRODUCT.md "Loss"). */
export const LOSS_REASONS = ["damagedWashing", "damagedOpening", "damagedPunching"] as const;
export type LossReason = (typeof LOSS_REASONS)[number];
export const LOSS_REASON_LABEL: Record<LossReason, string> = {
  damagedWashing: "Damaged in washing",
  damagedOpening: "Damaged in opening",
  damagedPunching: "Damaged in punching",
};
/** The stage a loss reason's step leads to: a step that stops earlier cannot lose cans in it. */
export const LOSS_STEP: Record<LossReason, (typeof PROCESS_TO)[number]> = { damagedWashing: "washed", damagedOpening: "opened", damagedPunching: "punched" };
/** Every reason the reject tallies (and the stock's `rejected`) are kept by: a sort's and processing losses'. */
export const TALLY_REASONS = [...REJECT_REASONS, ...LOSS_REASONS] as const;
export type TallyReason = (typeof TALLY_REASONS)[number];
/** A ledger line's reason: a reject's or loss's, or `stockCount` on the lines of a stock count's adjustment. */
export const LINE_REASONS = [...TALLY_REASONS, "stockCount"] as const;
export type LineReason = (typeof LINE_REASONS)[number];

// The one list of stages, reasons (above) and movement kinds. The database's CHECK
// constraints allow exactly these (tests/integration/ledger-codes.test.ts); a new
// code is added here and in a migration that widens those checks.
export const STAGES = ["hauled", "good", "washed", "opened", "punched", "claimed", "builtIn", "rejected", "recycled"] as const;
export type Stage = (typeof STAGES)[number];

export const MOVEMENT_KINDS = ["haul", "sort", "processing", "claim", "release", "builtIn", "recycling", "reversal", "stockCount"] as const;
export type MovementKind = (typeof MOVEMENT_KINDS)[number];

export const PROCESS_FROM = ["good", "washed", "opened"] as const;
export const PROCESS_TO = ["washed", "opened", "punched"] as const;

