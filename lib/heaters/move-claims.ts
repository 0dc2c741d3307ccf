import "server-only";
import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { transferClaim } from "@/lib/ledger/record";

/**
 * Moves claimed cans from one unit to another of the same drive: a release
 * and a claim, two ledger movements posted by one database call
 * (transferClaim), so the cans are never free for someone else in between
 * and a failed claim undoes the release.
 */
export async function moveClaims(actor: Actor, fromId: string, toId: string, quantity: number, trx: Knex.Transaction) {
  if (fromId === toId) throw new AppError("invalid_input", "Choose another unit.", { fields: { toHeaterId: "Choose another unit" } });
  const units = await trx("heater_units").select("id", "drive_id").where({ group_id: actor.group.id }).whereIn("id", [fromId, toId]);
  const from = units.find((u) => u.id === fromId);
  const to = units.find((u) => u.id === toId);
  if (!from) throw notFound("That heater unit");
  if (!to) throw new AppError("not_found", "The unit to move the cans to was not found.", { fields: { toHeaterId: "Choose one of this drive's units" } });
  if (!from.drive_id || from.drive_id !== to.drive_id) throw conflict("Claims move only between units of the same drive.");
  const { from: released, to: claimed } = await transferClaim(actor, fromId, toId, quantity, trx, { from: "moved to another unit", to: "moved from another unit" });
  return { from: released, to: claimed, quantity };
}
