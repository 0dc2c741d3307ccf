import type { Knex } from "knex";
import { conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import type { RunState } from "./schemas";

// A run's stops follow what happened in the ledger and on the road: a stop
// whose haul is undone is pending again, a skipped stop can be put back, and
// the run's state is recomputed from its stops in the same transaction.
// A haul's undo reopens its stop in the database (ledger_reverse, db/functions/ledger_writers.sql).

/**
 * Sets the run's state from its stops in the database (pickup_run_follow_stops,
 * db/functions/ledger_writers.sql, the one place the rule lives); `starts` marks
 * the run started when a stop was just settled. The caller holds the run's row.
 */
export async function followStops(trx: Knex.Transaction, runId: string, starts: boolean): Promise<RunState> {
  const { rows } = await trx.raw("select pickup_run_follow_stops(?, ?) as r", [runId, starts]);
  return rows[0].r.state as RunState;
}

/** Puts a skipped stop back on the run. The run's volunteer or an organiser only; a stop not skipped is 409. */
export async function unskipStop(actor: Actor, runId: string, stopId: string, trx: Knex.Transaction) {
  const run = await trx("pickup_runs").select("id", "assignee_id", "state").where({ id: runId, group_id: actor.group.id }).forUpdate().first();
  if (!run || (actor.role !== "organiser" && run.assignee_id !== actor.user.id)) throw notFound("That pickup run");
  if (run.state === "cancelled") throw conflict("This run is cancelled: its stops stay as they were.");
  const stop = await trx("pickup_run_stops").select("id", "status").where({ id: stopId, run_id: runId, group_id: actor.group.id }).first();
  if (!stop) throw notFound("That stop");
  if (stop.status !== "skipped") throw conflict(`This stop is ${stop.status}, not skipped.`);
  await trx("pickup_run_stops").where({ id: stopId }).update({ status: "pending", skip_reason: null, resolved_by: null, resolved_at: null });
  return { state: await followStops(trx, runId, false) };
}
