import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import { needRefusalMessage } from "@/lib/heaters/need";
import type { LineReason, Stage } from "./schemas";
import { countOf } from "@/lib/plural";

// The one place ledger lines are written. postMovement hands the movement to
// ledger_post() in PostgreSQL, which locks the drive (so writes to one drive
// run one after another and checks see settled balances), checks the debits,
// then writes the lines and the running totals, all in one round trip, so the
// lock is held for microseconds rather than a dozen network round trips. A
// refusal comes back as a message that says what is left. The CHECK
// (quantity >= 0) on the totals is the last line of defence.

export type Trx = Knex.Transaction;

export const STAGE_LABEL: Record<Stage, string> = {
  hauled: "hauled (not yet sorted)",
  good: "good (sorted, not yet washed)",
  washed: "washed",
  opened: "opened",
  punched: "punched",
  claimed: "claimed for this unit",
  builtIn: "built in",
  rejected: "rejected and waiting for recycling",
  recycled: "recycled",
};

export interface LineSpec {
  from: Stage | null;
  to: Stage | null;
  quantity: number;
  dropPointId?: string | null;
  heaterUnitId?: string | null;
  reason?: LineReason | null;
  isEstimate?: boolean;
  note?: string;
  haulId?: string | null;
  sortId?: string | null;
  reversesId?: string | null;
  /** Day the counted cans belong to (YYYY-MM-DD); reversals pass the original's day. */
  countedDay?: string;
}

export interface MovementSpec {
  groupId: string;
  driveId: string;
  actorId: string;
  kind: "haul" | "sort" | "processing" | "claim" | "release" | "builtIn" | "recycling" | "reversal" | "stockCount";
  occurredAt?: Date;
  reversesMovementId?: string;
  details?: Record<string, unknown>;
  /** When the caller already wrote the movement row (a haul or sort row must refer to it first). */
  existingMovementId?: string;
  /** The new movement's id, when the caller needs to know it before writing (to answer in advance). */
  movementId?: string;
}

/** Runs `fn` in the caller's transaction when there is one, else in a new one. */
// (No "server-only" here or in write*.ts/reverse.ts: the demo seed runs these in
// plain Node with its own transaction. record.ts is the server's entry point.)
export function inTx<T>(conn: Knex | Trx, fn: (trx: Trx) => Promise<T>): Promise<T> {
  return (conn as Trx).isTransaction ? fn(conn as Trx) : conn.transaction(fn);
}

/** Locks the drive for ledger writes; another group's drive is 404. */
export async function lockDrive(trx: Trx, groupId: string, driveId: string): Promise<{ id: string; name: string }> {
  const row = await trx("drives").select("id", "name").where({ id: driveId, group_id: groupId }).forNoKeyUpdate().first();
  if (!row) throw notFound("That drive");
  return row;
}

export function isoDay(d: Date): string {
  return d.toISOString().slice(0, 10);
}

/** One call of ledger_post, ready to run alone or inside another statement. */
export interface LedgerCall {
  sql: string;
  bindings: [string];
}

export async function postMovement(trx: Trx, m: MovementSpec, lines: LineSpec[]): Promise<{ movementId: string; lineIds: string[] }> {
  return runLedgerCall(trx, ledgerPostCall(m, lines));
}

export async function runLedgerCall(conn: Knex | Trx, call: LedgerCall): Promise<{ movementId: string; lineIds: string[] }> {
  try {
    const { rows } = await conn.raw(`select ${call.sql} as r`, call.bindings);
    const r = rows[0].r as { movementId: string; lineIds: (string | number)[] };
    return { movementId: r.movementId, lineIds: r.lineIds.map(String) };
  } catch (error) {
    throw ledgerRefusal(error) ?? error;
  }
}

export function ledgerPostCall(m: MovementSpec, lines: LineSpec[]): LedgerCall {
  for (const line of lines) {
    if (!Number.isInteger(line.quantity) || line.quantity <= 0) throw new AppError("internal", "A ledger line needs a positive whole quantity.");
  }
  const occurredAt = m.occurredAt ?? new Date();
  // One round trip: ledger_post (db/migrations/*_ledger_post_function.ts) locks the drive, checks, writes lines and totals.
  const payload = {
    groupId: m.groupId,
    driveId: m.driveId,
    actorId: m.actorId,
    kind: m.kind,
    occurredAt: occurredAt.toISOString(),
    day: isoDay(occurredAt),
    movementId: m.movementId ?? null,
    existingMovementId: m.existingMovementId ?? null,
    reversesMovementId: m.reversesMovementId ?? null,
    details: m.details ?? {},
    lines: lines.map((l) => ({
      from: l.from,
      to: l.to,
      quantity: l.quantity,
      dropPointId: l.dropPointId ?? null,
      heaterUnitId: l.heaterUnitId ?? null,
      reason: l.reason ?? null,
      isEstimate: l.isEstimate ?? false,
      note: l.note ?? "",
      haulId: l.haulId ?? null,
      sortId: l.sortId ?? null,
      reversesId: l.reversesId ?? null,
      countedDay: l.countedDay ?? null,
    })),
  };
  return { sql: "ledger_post(?::jsonb)", bindings: [JSON.stringify(payload)] };
}

/** The function's refusals as the messages people see; anything else is not ours to translate. */
export function ledgerRefusal(error: unknown): AppError | null {
  const e = error as { code?: string; detail?: string };
  if (e?.code === "CT404") return notFound("That drive");
  if (e?.code !== "CT409") return null;
  const d = JSON.parse(e.detail ?? "{}") as { kind: string; stage?: Stage; needed?: number; available?: number; remaining?: number; cans?: number; spare?: number };
  if (d.kind === "need") {
    // From the unit-need trigger (migration 20261203030000): the claim would pass cans + spare.
    const n = { remaining: Number(d.remaining), cans: Number(d.cans), spare: Number(d.spare) };
    return conflict(needRefusalMessage(n), { remaining: n.remaining });
  }
  if (d.kind === "debit" && d.stage) {
    const have = Number(d.available);
    const needed = Number(d.needed);
    return conflict(`That needs ${countOf(needed, "can")} ${STAGE_LABEL[d.stage]}, but only ${have} left.`, { available: have, stage: d.stage });
  }
  const before = Number(d.available);
  return conflict(`Not enough unclaimed cans: only ${before} left unclaimed. Release a claim first, or claim fewer.`, {
    available: Math.max(0, before),
  });
}

export async function bumpDropPoint(
  trx: Trx,
  groupId: string,
  driveId: string,
  dropPointId: string,
  delta: Partial<Record<"hauls" | "bags" | "good_cans" | "rejected_cans", number>>,
): Promise<void> {
  const v = { hauls: 0, bags: 0, good_cans: 0, rejected_cans: 0, ...delta };
  await trx.raw(
    `insert into drop_point_tallies (drop_point_id, group_id, drive_id) values (?, ?, ?) on conflict (drop_point_id) do nothing`,
    [dropPointId, groupId, driveId],
  );
  await trx.raw(
    `update drop_point_tallies set hauls = hauls + ?, bags = bags + ?, good_cans = good_cans + ?, rejected_cans = rejected_cans + ?
     where drop_point_id = ?`,
    [v.hauls, v.bags, v.good_cans, v.rejected_cans, dropPointId],
  );
}
