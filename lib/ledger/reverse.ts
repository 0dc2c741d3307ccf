import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { applyCalibration, calibrationDelta } from "./calibration";
import { bumpDropPoint, inTx, isoDay, lockDrive, postMovement, type LineSpec } from "./post";
import type { LineReason, Stage } from "./schemas";
import { reopenStopOfHaul } from "@/lib/runs/stop-follow";

// Undo by a new movement whose lines run the other way; both stay in history.
// Only the author or an organiser may undo, and each movement only once.

type Conn = Knex | Knex.Transaction;

/** `reason`: why it is undone (an organiser correcting someone else's entry); kept with the undo. */
export async function reverseMovement(actor: Actor, movementId: string, conn: Conn, reason?: string) {
  return inTx(conn, async (trx) => {
    const groupId = actor.group.id;
    // Movements never change once written, so the row read here stays true after the lock.
    const movement = await trx("movements").where({ id: movementId, group_id: groupId }).first();
    if (!movement) throw notFound("That entry");
    if (movement.recorded_by !== actor.user.id && actor.role !== "organiser") {
      throw new AppError("forbidden", "Only the person who recorded this entry, or an organiser, can undo it.");
    }
    await lockDrive(trx, groupId, movement.drive_id);
    if (movement.kind === "reversal") throw conflict("This entry is itself an undo; record the entry again instead.");
    const already = await trx("movements").select("id").where({ reverses_movement_id: movementId }).first();
    if (already) throw conflict("This entry was already undone.");

    if (movement.kind === "haul") {
      const haul = await trx("hauls").where({ movement_id: movementId }).first();
      if (haul.sort_id) throw conflict("This haul was already sorted; undo the sort first.");
      await trx("hauls").where({ id: haul.id }).update({ reversed_at: trx.fn.now() });
      await bumpDropPoint(trx, groupId, haul.drive_id, haul.drop_point_id, { hauls: -1, bags: -haul.bags });
      // The pickup-run stop this haul settled is open again, so it can be logged anew.
      await reopenStopOfHaul(trx, groupId, haul.id);
    }
    if (movement.kind === "sort") {
      const sort = await trx("sorts").where({ movement_id: movementId }).first();
      await trx("hauls").where({ sort_id: sort.id }).update({ sort_id: null });
      await trx("sorts").where({ id: sort.id }).update({ reversed_at: trx.fn.now() });
      const delta = calibrationDelta({ counted: sort.counted, haulCount: sort.haul_count, bags: sort.bags, weightKg: sort.weight_kg === null ? null : Number(sort.weight_kg) });
      await applyCalibration(trx, groupId, delta, -1);
    }

    const original = await trx("ledger_lines").where({ movement_id: movementId }).orderBy("id");
    const lines: LineSpec[] = original.map((l) => ({
      from: l.to_stage as Stage | null,
      to: l.from_stage as Stage | null,
      quantity: l.quantity,
      dropPointId: l.drop_point_id,
      heaterUnitId: l.heater_unit_id,
      reason: l.reason as LineReason | null,
      isEstimate: l.is_estimate,
      haulId: l.haul_id,
      sortId: l.sort_id,
      reversesId: String(l.id),
      countedDay: isoDay(new Date(l.occurred_at)),
      note: reason ? `undo: ${reason}` : "undo",
    }));
    const result = await postMovement(
      trx,
      { groupId, driveId: movement.drive_id, actorId: actor.user.id, kind: "reversal", reversesMovementId: movementId, details: reason ? { reversedKind: movement.kind, reason } : { reversedKind: movement.kind } },
      lines,
    );
    return { movementId: result.movementId, reverses: movementId, reversedKind: movement.kind as string, driveId: movement.drive_id as string, lines: lines.length, reason: reason ?? null };
  });
}
