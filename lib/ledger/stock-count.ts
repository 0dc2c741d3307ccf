import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { ledgerPostCall, runLedgerCall, type LineSpec, type OwnRefusals } from "./post";
import { COUNTABLE_LABEL, COUNTABLE_STAGES, countDifferences, type CountableStage, type StockCountInput } from "./stock-count-schema";
import type { PostedStockCount } from "./types";

// A stock count (PRODUCT.md "Stock count"): what is physically on hand per
// stage, posted as ONE movement of kind `stockCount` that moves each stage's
// difference in from, or out to, "outside the ledger" (null), every line with
// the reason `stockCount`. ledger_post applies the usual rules: no stage below
// zero, never fewer processed cans than claimed. Undoing it is an ordinary
// reversal. The differences are taken against the totals read first, and
// ledger_post posts them only when, under the drive's lock, the counted
// stages still hold those totals (`expect`), the ones the organiser counted against.

type Conn = Knex | Knex.Transaction;

const PROCESSED: CountableStage[] = ["good", "washed", "opened", "punched"];

function staleCount(input: StockCountInput, of: (s: string) => number) {
  const moved = COUNTABLE_STAGES.filter((s) => input.counted[s] !== undefined && input.expected[s] !== of(s));
  return conflict(
    `The running totals changed while you counted: ${moved.map((s) => `${COUNTABLE_LABEL[s].toLowerCase()} is now ${of(s)}, not ${input.expected[s]}`).join("; ")}. Check the count against the new totals and post it again.`,
    { totals: Object.fromEntries(COUNTABLE_STAGES.map((s) => [s, of(s)])) },
  );
}

function overClaimed(processedAfter: number, claimed: number) {
  return conflict(
    `That count leaves ${processedAfter} good, washed, opened and punched cans, but builders have claimed ${claimed}. Ask them to release claims first, or count again.`,
    { available: processedAfter, claimed },
  );
}

export async function recordStockCount(actor: Actor, driveId: string, input: StockCountInput, conn: Conn): Promise<PostedStockCount> {
  const groupId = actor.group.id;
  // Read without a lock; ledger_post checks under the drive's lock that the counted stages still hold these totals.
  const { rows } = await conn.raw(
    `select coalesce((select json_object_agg(b.stage, b.quantity) from stage_balances b
                      where b.drive_id = d.id and b.drop_point_id is null and b.heater_unit_id is null and b.stage = any (?)), '{}') as totals
     from drives d where d.id = ? and d.group_id = ?`,
    [[...COUNTABLE_STAGES, "claimed"], driveId, groupId],
  );
  if (!rows[0]) throw notFound("That drive");
  const totals: Record<string, number> = Object.fromEntries(Object.entries(rows[0].totals as Record<string, number | string>).map(([k, v]) => [k, Number(v)]));
  const of = (s: string) => totals[s] ?? 0;

  if (COUNTABLE_STAGES.some((s) => input.counted[s] !== undefined && input.expected[s] !== of(s))) throw staleCount(input, of);
  const lines = countDifferences(input.counted, totals);
  if (lines.length === 0) {
    throw new AppError("invalid_input", "Every count matches the running totals; there is nothing to adjust.", { fields: { counted: "Nothing differs from the running totals." } });
  }
  // Said here in the count's own words; ledger_post refuses the same case anyway.
  const processedAfter = PROCESSED.reduce((sum, s) => sum + (input.counted[s] ?? of(s)), 0);
  if (processedAfter < of("claimed")) throw overClaimed(processedAfter, of("claimed"));

  const occurredAt = new Date();
  const specs: LineSpec[] = lines.map((l) =>
    l.difference > 0
      ? { from: null, to: l.stage, quantity: l.difference, reason: "stockCount", note: input.reason }
      : { from: l.stage, to: null, quantity: -l.difference, reason: "stockCount", note: input.reason },
  );
  const details = { reason: input.reason, lines };
  const expect = Object.fromEntries(COUNTABLE_STAGES.filter((s) => input.counted[s] !== undefined).map((s) => [s, input.expected[s]]));
  const own: OwnRefusals = {
    stale: (d) => {
      const now = d.totals as Record<string, number>;
      return staleCount(input, (s) => Number(now[s] ?? 0));
    },
    unclaimed: (d) => overClaimed(Number(d.processed), Number(d.claimed)),
  };
  const { movementId } = await runLedgerCall(conn, ledgerPostCall({ groupId, driveId, actorId: actor.user.id, kind: "stockCount", occurredAt, details }, specs, { expect }), own);
  return { movementId, driveId, reason: input.reason, lines, occurredAt: occurredAt.toISOString() };
}
