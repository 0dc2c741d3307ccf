import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import { needRefusalMessage } from "@/lib/heaters/need";
import type { LineReason, MovementKind, Stage } from "./schemas";
import { countOf } from "@/lib/plural";

// The one place ledger lines are written. Every writer ends in one call of a
// function in db/functions/ (ledger_post, or ledger_haul / ledger_sort /
// ledger_reverse / ledger_unit, which call it): the function locks the drive
// (so writes to one drive run one after another and checks see settled
// balances), re-checks what the writer read before, then writes the rows, the
// lines and every running total before it returns, so the drive's lock is held
// only inside the database, never across a network round trip. A refusal comes
// back as a message that says what is left. The CHECK (quantity >= 0) on the
// totals is the last line of defence.

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
  /** Null only for a unit on no drive (ledger_unit then locks the unit alone and moves nothing). */
  driveId: string | null;
  actorId: string;
  kind: MovementKind;
  occurredAt?: Date;
  reversesMovementId?: string;
  details?: Record<string, unknown>;
  /** When the caller already wrote the movement row (a haul or sort row must refer to it first). */
  existingMovementId?: string;
  /** The new movement's id, when the caller needs to know it before writing (to answer in advance). */
  movementId?: string;
}

export function isoDay(d: Date): string {
  return d.toISOString().slice(0, 10);
}

/** One call of a ledger function, ready to run alone or inside another statement. */
export interface LedgerCall {
  sql: string;
  bindings: [string];
}

/** A writer's own refusals (CT409 detail kinds raised by its function), as the messages people see. */
export type OwnRefusals = Record<string, (detail: Record<string, unknown>) => AppError>;

export async function postMovement(conn: Knex | Trx, m: MovementSpec, lines: LineSpec[]): Promise<{ movementId: string; lineIds: string[] }> {
  return runLedgerCall(conn, ledgerPostCall(m, lines));
}

export async function runLedgerCall(conn: Knex | Trx, call: LedgerCall, own?: OwnRefusals): Promise<{ movementId: string; lineIds: string[] }> {
  const r = await runLedgerFunction<{ movementId: string; lineIds: (string | number)[] }>(conn, call, own);
  return { movementId: r.movementId, lineIds: r.lineIds.map(String) };
}

/** Runs the call (one round trip) and returns the function's JSON answer; its refusals become AppErrors. */
export async function runLedgerFunction<T>(conn: Knex | Trx, call: LedgerCall, own?: OwnRefusals): Promise<T> {
  try {
    const { rows } = await conn.raw(`select ${call.sql} as r`, call.bindings);
    return rows[0].r as T;
  } catch (error) {
    throw ledgerRefusal(error, own) ?? error;
  }
}

/** The payload every ledger function takes (see db/functions/ledger_post.sql), with a writer's own fields in `extra`. */
export function ledgerPayload(m: MovementSpec, lines: LineSpec[], extra: Record<string, unknown> = {}) {
  for (const line of lines) {
    if (!Number.isInteger(line.quantity) || line.quantity <= 0) throw new AppError("internal", "A ledger line needs a positive whole quantity.");
  }
  const occurredAt = m.occurredAt ?? new Date();
  return {
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
    ...extra,
  };
}

/** `fn` is one of db/functions' ledger functions; the payload is ledgerPayload's. */
export function ledgerCall(fn: "ledger_post" | "ledger_haul" | "ledger_sort" | "ledger_reverse" | "ledger_unit" | "ledger_units" | "heater_unit_move" | "heater_unit_archive" | "heater_unit_glazing" | "record_archive" | "record_delete", payload: object): LedgerCall {
  return { sql: `${fn}(?::jsonb)`, bindings: [JSON.stringify(payload)] };
}

export function ledgerPostCall(m: MovementSpec, lines: LineSpec[], extra?: Record<string, unknown>): LedgerCall {
  return ledgerCall("ledger_post", ledgerPayload(m, lines, extra));
}

const NOT_FOUND_LABEL: Record<string, string> = {
  drive: "That drive",
  dropPoint: "That drop point",
  haul: "One of those hauls",
  unit: "That heater unit",
  run: "That pickup run",
  stop: "That stop",
};

/** The function's refusals as the messages people see; anything else is not ours to translate. */
export function ledgerRefusal(error: unknown, own?: OwnRefusals): AppError | null {
  const e = error as { code?: string; detail?: string };
  if (e?.code === "CT404") {
    const what = (JSON.parse(e.detail || "{}") as { what?: string }).what ?? "drive";
    return notFound(NOT_FOUND_LABEL[what] ?? "That record");
  }
  if (e?.code !== "CT409") return null;
  const d = JSON.parse(e.detail ?? "{}") as { kind: string; stage?: Stage; needed?: number; available?: number; remaining?: number; cans?: number; spare?: number };
  if (own && Object.hasOwn(own, d.kind)) return own[d.kind](d as Record<string, unknown>);
  if (d.kind === "unitArchived") return conflict("That heater unit is archived: restore it before claiming cans for it.");
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
