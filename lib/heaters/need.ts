/**
 * What a heater unit needs: its cans plus its share of the drive's spare
 * allowance (PRODUCT.md: target = Σ cans of the units + spare, default 5 %).
 * Claims (claimed + built in) never go past it; the database refuses it in
 * the same statement that posts the claim (the trigger in db/functions/unit_need.sql),
 * and the claim form refuses it before sending, with this same message.
 * Pure; safe to import in the client.
 */
import { formatNumber } from "./format";
import { plural } from "@/lib/plural";

export interface UnitNeed {
  cans: number;
  spare: number;
  /** cans + spare: the most that may be claimed and built in together. */
  need: number;
  /** Cans still to claim: need − claimed − built in, never below 0. */
  remaining: number;
}

/**
 * The unit's need from its cans and its spare share. The share, ⌈cans × spare % / 100⌉, is worked
 * out in one place only, the database's unit_spare (db/functions/unit_need.sql), which the claim
 * trigger enforces; the reads select it (lib/heaters/queries.ts, lib/notify/unit-ready.ts).
 */
export function unitNeed(cans: number, spare: number, claimed: number, builtIn: number): UnitNeed {
  const need = cans + spare;
  return { cans, spare, need, remaining: Math.max(0, need - claimed - builtIn) };
}

/** The refusal people see when a claim would pass the unit's need (server and form alike). */
export function needRefusalMessage(n: { remaining: number; cans: number; spare: number }): string {
  const what = `its ${formatNumber(n.cans)} cans plus ${formatNumber(n.spare)} spare`;
  if (n.remaining <= 0) return `This unit needs no more cans: ${what} are all claimed or built in already.`;
  const cans = plural(n.remaining, "can");
  return `This unit needs only ${formatNumber(n.remaining)} more ${cans} (${what}). Claim ${formatNumber(n.remaining)} or fewer.`;
}
