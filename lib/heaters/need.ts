/**
 * What a heater unit needs: its cans plus its share of the drive's spare
 * allowance (PRODUCT.md: target = Σ cans of the units + spare, default 5 %).
 * Claims (claimed + built in) never go past it; the database refuses it in
 * the same statement that posts the claim (db/migrations/20261203030000_unit_need_check.ts),
 * and the claim form refuses it before sending, with this same message.
 * Pure; safe to import in the client.
 */
import { formatNumber } from "./format";
import { plural } from "@/lib/plural";

/**
 * The unit's spare: cans × spare % / 100, rounded UP to a whole can, so a unit
 * never runs one can short of its share. Rounding per unit means the shares of
 * a drive's units may add up to a few cans more than the drive's own spare
 * (rounded once over Σ cans), less than one can per unit. The database rounds
 * the same way: ceil(cans * spare_percent / 100) in exact numeric arithmetic;
 * the tiny tolerance here stops float noise (10000 × 0.07 / 100 = 7.000000000000001)
 * from ever adding a can the exact sum would not.
 */
export function unitSpare(cans: number, sparePercent: number): number {
  return Math.max(0, Math.ceil((cans * sparePercent) / 100 - 1e-9));
}

export interface UnitNeed {
  cans: number;
  spare: number;
  /** cans + spare: the most that may be claimed and built in together. */
  need: number;
  /** Cans still to claim: need − claimed − built in, never below 0. */
  remaining: number;
}

export function unitNeed(cans: number, sparePercent: number, claimed: number, builtIn: number): UnitNeed {
  const spare = unitSpare(cans, sparePercent);
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
