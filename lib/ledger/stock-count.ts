import type { Knex } from "knex";
import { AppError, conflict } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { inTx, lockDrive, postMovement, type LineSpec } from "./post";
import { COUNTABLE_LABEL, COUNTABLE_STAGES, countDifferences, type CountableStage, type StockCountInput } from "./stock-count-schema";

// A stock count (PRODUCT.md "Stock count"): what is physically on hand per
// stage, posted as ONE movement of kind `stockCount` that moves each stage's
// difference in from, or out to, "outside the ledger" (null), every line with
// the reason `stockCount`. ledger_post applies the usual rules: no stage below
// zero, never fewer processed cans than claimed. Undoing it is an ordinary
// reversal. The differences are taken against the totals under the drive's
// lock, and only when they are still the ones the organiser counted against.

type Conn = Knex | Knex.Transaction;

const PROCESSED: CountableStage[] = ["good", "washed", "opened", "punched"];

export async function recordStockCount(actor: Actor, driveId: string, input: StockCountInput, conn: Conn) {
  return inTx(conn, async (trx) => {
    const groupId = actor.group.id;
    await lockDrive(trx, groupId, driveId);
    const rows = await trx("stage_balances")
      .select("stage", "quantity")
      .where({ drive_id: driveId, group_id: groupId })
      .whereNull("drop_point_id")
      .whereNull("heater_unit_id")
      .whereIn("stage", [...COUNTABLE_STAGES, "claimed"]);
    const totals: Record<string, number> = Object.fromEntries(rows.map((r) => [r.stage, Number(r.quantity)]));
    const of = (s: string) => totals[s] ?? 0;

    const moved = COUNTABLE_STAGES.filter((s) => input.counted[s] !== undefined && input.expected[s] !== of(s));
    if (moved.length > 0) {
      throw conflict(
        `The running totals changed while you counted: ${moved.map((s) => `${COUNTABLE_LABEL[s].toLowerCase()} is now ${of(s)}, not ${input.expected[s]}`).join("; ")}. Check the count against the new totals and post it again.`,
        { totals: Object.fromEntries(COUNTABLE_STAGES.map((s) => [s, of(s)])) },
      );
    }
    const lines = countDifferences(input.counted, totals);
    if (lines.length === 0) {
      throw new AppError("invalid_input", "Every count matches the running totals; there is nothing to adjust.", { fields: { counted: "Nothing differs from the running totals." } });
    }
    // Said here in the count's own words; ledger_post refuses the same case anyway.
    const processedAfter = PROCESSED.reduce((sum, s) => sum + (input.counted[s] ?? of(s)), 0);
    if (processedAfter < of("claimed")) {
      throw conflict(
        `That count leaves ${processedAfter} good, washed, opened and punched cans, but builders have claimed ${of("claimed")}. Ask them to release claims first, or count again.`,
        { available: processedAfter, claimed: of("claimed") },
      );
    }

    const occurredAt = new Date();
    const specs: LineSpec[] = lines.map((l) =>
      l.difference > 0
        ? { from: null, to: l.stage, quantity: l.difference, reason: "stockCount", note: input.reason }
        : { from: l.stage, to: null, quantity: -l.difference, reason: "stockCount", note: input.reason },
    );
    const details = { reason: input.reason, lines };
    const { movementId } = await postMovement(trx, { groupId, driveId, actorId: actor.user.id, kind: "stockCount", occurredAt, details }, specs);
    return { movementId, driveId, reason: input.reason, lines, occurredAt: occurredAt.toISOString() };
  });
}
