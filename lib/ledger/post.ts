import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { RejectReason, Stage } from "./schemas";

// The one place ledger lines are written. Every writer locks the drive first
// (so writes to one drive run one after another and checks see settled
// balances), checks the debits with a message that says what is left, then
// writes the lines and the running totals in the same transaction. The
// CHECK (quantity >= 0) on the totals is the last line of defence.

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
  reason?: RejectReason | null;
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
  kind: "haul" | "sort" | "processing" | "claim" | "release" | "builtIn" | "recycling" | "reversal";
  occurredAt?: Date;
  reversesMovementId?: string;
  details?: Record<string, unknown>;
  /** When the caller already wrote the movement row (a haul or sort row must refer to it first). */
  existingMovementId?: string;
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

type Key = { dropPointId: string | null; heaterUnitId: string | null; stage: Stage };
const keyOf = (k: Key) => `${k.dropPointId ?? ""}|${k.heaterUnitId ?? ""}|${k.stage}`;

// Drop-point rows exist only for open estimates, heater rows only for claims and builds.
function keysFor(stage: Stage, line: LineSpec): Key[] {
  const keys: Key[] = [{ dropPointId: null, heaterUnitId: null, stage }];
  if (stage === "hauled" && line.dropPointId) keys.push({ dropPointId: line.dropPointId, heaterUnitId: null, stage });
  if ((stage === "claimed" || stage === "builtIn") && line.heaterUnitId) keys.push({ dropPointId: null, heaterUnitId: line.heaterUnitId, stage });
  return keys;
}

export function isoDay(d: Date): string {
  return d.toISOString().slice(0, 10);
}

export async function postMovement(trx: Trx, m: MovementSpec, lines: LineSpec[]): Promise<{ movementId: string; lineIds: string[] }> {
  const occurredAt = m.occurredAt ?? new Date();
  const deltas = new Map<string, Key & { delta: number }>();
  for (const line of lines) {
    if (!Number.isInteger(line.quantity) || line.quantity <= 0) throw new AppError("internal", "A ledger line needs a positive whole quantity.");
    for (const [stage, sign] of [[line.from, -1], [line.to, 1]] as const) {
      if (!stage) continue;
      for (const k of keysFor(stage, line)) {
        const entry = deltas.get(keyOf(k)) ?? { ...k, delta: 0 };
        entry.delta += sign * line.quantity;
        deltas.set(keyOf(k), entry);
      }
    }
  }
  await checkDebits(trx, m.driveId, [...deltas.values()].filter((d) => d.delta < 0));

  const [movement] = m.existingMovementId
    ? [{ id: m.existingMovementId }]
    : await trx("movements")
    .insert({
      group_id: m.groupId,
      drive_id: m.driveId,
      kind: m.kind,
      recorded_by: m.actorId,
      occurred_at: occurredAt,
      reverses_movement_id: m.reversesMovementId ?? null,
      details: JSON.stringify(m.details ?? {}),
    })
    .returning("id");
  const lineIds: string[] = [];
  if (lines.length) {
    const inserted = await trx("ledger_lines")
      .insert(
        lines.map((l) => ({
          movement_id: movement.id,
          group_id: m.groupId,
          drive_id: m.driveId,
          drop_point_id: l.dropPointId ?? null,
          heater_unit_id: l.heaterUnitId ?? null,
          from_stage: l.from,
          to_stage: l.to,
          quantity: l.quantity,
          reason: l.reason ?? null,
          is_estimate: l.isEstimate ?? false,
          note: l.note ?? "",
          occurred_at: occurredAt,
          recorded_by: m.actorId,
          reverses_id: l.reversesId ?? null,
          haul_id: l.haulId ?? null,
          sort_id: l.sortId ?? null,
        })),
      )
      .returning("id");
    lineIds.push(...inserted.map((r: { id: string | number }) => String(r.id)));
  }

  for (const d of deltas.values()) {
    if (d.delta === 0) continue;
    // Insert-then-update: CHECK constraints apply to an upsert's proposed row, so a negative delta cannot ride on it.
    await trx.raw(
      `insert into stage_balances (group_id, drive_id, drop_point_id, heater_unit_id, stage, quantity) values (?, ?, ?, ?, ?, 0)
       on conflict on constraint stage_balances_key do nothing`,
      [m.groupId, m.driveId, d.dropPointId, d.heaterUnitId, d.stage],
    );
    await trx.raw(
      `update stage_balances set quantity = quantity + ? where drive_id = ? and drop_point_id is not distinct from ?
         and heater_unit_id is not distinct from ? and stage = ?`,
      [d.delta, m.driveId, d.dropPointId, d.heaterUnitId, d.stage],
    );
  }
  await applyCounted(trx, m, lines, isoDay(occurredAt));
  const driveDelta = (stage: Stage) => deltas.get(keyOf({ dropPointId: null, heaterUnitId: null, stage }))?.delta ?? 0;
  const unclaimedDelta = driveDelta("good") + driveDelta("washed") + driveDelta("opened") + driveDelta("punched") - driveDelta("claimed");
  await checkUnclaimed(trx, m.driveId, unclaimedDelta);
  return { movementId: movement.id, lineIds };
}

async function checkDebits(trx: Trx, driveId: string, debits: (Key & { delta: number })[]): Promise<void> {
  for (const d of debits) {
    const row = await trx("stage_balances")
      .select("quantity")
      .where({ drive_id: driveId, stage: d.stage })
      .andWhere((q) => (d.dropPointId ? q.where("drop_point_id", d.dropPointId) : q.whereNull("drop_point_id")))
      .andWhere((q) => (d.heaterUnitId ? q.where("heater_unit_id", d.heaterUnitId) : q.whereNull("heater_unit_id")))
      .first();
    const have = Number(row?.quantity ?? 0);
    if (have + d.delta < 0) {
      throw conflict(`That needs ${-d.delta} cans ${STAGE_LABEL[d.stage]}, but only ${have} left.`, { available: have, stage: d.stage });
    }
  }
}

/** Claims reserve processed cans; no write may leave more claimed than there are. */
async function checkUnclaimed(trx: Trx, driveId: string, change: number): Promise<void> {
  const rows = await trx("stage_balances")
    .select("stage", "quantity")
    .where({ drive_id: driveId })
    .whereNull("drop_point_id")
    .whereNull("heater_unit_id")
    .whereIn("stage", ["good", "washed", "opened", "punched", "claimed"]);
  let processed = 0;
  let claimed = 0;
  for (const r of rows) {
    if (r.stage === "claimed") claimed = Number(r.quantity);
    else processed += Number(r.quantity);
  }
  if (processed - claimed < 0) {
    const before = processed - claimed - change;
    throw conflict(`Not enough unclaimed cans: only ${before} left unclaimed. Release a claim first, or claim fewer.`, {
      available: Math.max(0, before),
    });
  }
}

/** Counted cans (a sort's good and rejects, or their reversal) feed the tallies and the daily totals. */
async function applyCounted(trx: Trx, m: MovementSpec, lines: LineSpec[], day: string): Promise<void> {
  for (const l of lines) {
    const sign = l.from === null ? 1 : l.to === null ? -1 : 0;
    const stage = l.from ?? l.to;
    if (sign === 0 || (stage !== "good" && stage !== "rejected")) continue;
    const q = sign * l.quantity;
    if (stage === "good") {
      await trx.raw(
        `insert into drive_daily_good (drive_id, day, good_cans) values (?, ?, ?)
         on conflict (drive_id, day) do update set good_cans = drive_daily_good.good_cans + excluded.good_cans`,
        [m.driveId, l.countedDay ?? day, q],
      );
    } else {
      for (const dp of l.dropPointId ? [null, l.dropPointId] : [null]) {
        await trx.raw(
          `insert into reject_tallies (group_id, drive_id, drop_point_id, reason, quantity) values (?, ?, ?, ?, 0)
           on conflict on constraint reject_tallies_key do nothing`,
          [m.groupId, m.driveId, dp, l.reason ?? "other"],
        );
        await trx.raw(
          `update reject_tallies set quantity = quantity + ? where drive_id = ? and drop_point_id is not distinct from ? and reason = ?`,
          [q, m.driveId, dp, l.reason ?? "other"],
        );
      }
    }
    if (l.dropPointId) {
      await bumpDropPoint(trx, m.groupId, m.driveId, l.dropPointId, stage === "good" ? { good_cans: q } : { rejected_cans: q });
    }
  }
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
