import { randomUUID } from "node:crypto";
import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { calibrationDelta } from "./calibration";
import { isoDay, ledgerCall, ledgerPayload, runLedgerFunction, type LineSpec, type OwnRefusals } from "./post";
import type { LineReason, Stage } from "./schemas";

// Undo by a new movement whose lines run the other way; both stay in history.
// Only the author or an organiser may undo, and each movement only once.
// The movement, its lines and its haul or sort rows are read first (what an
// undo needs of them never changes); ledger_reverse (db/functions/
// ledger_writers.sql) then locks the drive, re-checks that it is not undone
// yet (and a haul not sorted meanwhile) and writes the undo and its bookkeeping.

type Conn = Knex | Knex.Transaction;

const REFUSALS: OwnRefusals = {
  alreadyUndone: () => conflict("This entry was already undone."),
  haulSorted: () => conflict("This haul was already sorted; undo the sort first."),
};

/** `reason`: why it is undone (an organiser correcting someone else's entry); kept with the undo. */
export async function reverseMovement(actor: Actor, movementId: string, conn: Conn, reason?: string) {
  const groupId = actor.group.id;
  const { rows } = await conn.raw(
    `select m.*, exists (select 1 from movements r where r.reverses_movement_id = m.id) as undone,
            (select row_to_json(h) from hauls h where h.movement_id = m.id) as haul,
            (select row_to_json(s) from sorts s where s.movement_id = m.id) as sort,
            coalesce((select json_agg(l order by l.id) from ledger_lines l where l.movement_id = m.id), '[]') as lines
     from movements m where m.id = ? and m.group_id = ?`,
    [movementId, groupId],
  );
  const movement = rows[0];
  if (!movement) throw notFound("That entry");
  if (movement.recorded_by !== actor.user.id && actor.role !== "organiser") {
    throw new AppError("forbidden", "Only the person who recorded this entry, or an organiser, can undo it.");
  }
  if (movement.kind === "reversal") throw conflict("This entry is itself an undo; record the entry again instead.");
  if (movement.undone) throw REFUSALS.alreadyUndone({});

  let undo: Record<string, unknown> = { kind: movement.kind };
  if (movement.kind === "haul") {
    const haul = movement.haul;
    if (haul.sort_id) throw REFUSALS.haulSorted({});
    undo = { ...undo, haulId: haul.id, dropPointId: haul.drop_point_id, bags: haul.bags };
  }
  if (movement.kind === "sort") {
    const sort = movement.sort;
    const calibration = calibrationDelta({ counted: sort.counted, haulCount: sort.haul_count, bags: sort.bags, weightKg: sort.weight_kg });
    undo = { ...undo, sortId: sort.id, calibration };
  }

  const original = movement.lines as { id: number; to_stage: string | null; from_stage: string | null; quantity: number; drop_point_id: string | null; heater_unit_id: string | null; reason: string | null; is_estimate: boolean; haul_id: string | null; sort_id: string | null; occurred_at: string }[];
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
  const payload = ledgerPayload(
    {
      groupId,
      driveId: movement.drive_id,
      actorId: actor.user.id,
      kind: "reversal",
      movementId: randomUUID(),
      reversesMovementId: movementId,
      details: reason ? { reversedKind: movement.kind, reason } : { reversedKind: movement.kind },
    },
    lines,
    { undo },
  );
  const result = await runLedgerFunction<{ movementId: string }>(conn, ledgerCall("ledger_reverse", payload), REFUSALS);
  return { movementId: result.movementId, reverses: movementId, reversedKind: movement.kind as string, driveId: movement.drive_id as string, lines: lines.length, reason: reason ?? null };
}
