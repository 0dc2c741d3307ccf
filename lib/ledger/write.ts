import { randomUUID } from "node:crypto";
import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { estimateHaulCans } from "./estimate";
import { allocate } from "./allocate";
import { calibrationDelta, calibrationOfRow } from "./calibration";
import { entryTimeOf, resolveEntryTime } from "./entry-time-query";
import { askUnlessConfirmed, checkHaul, checkSort } from "./plausibility";
import { ledgerCall, ledgerPayload, ledgerPostCall, postMovement, runLedgerCall, runLedgerFunction, type LedgerCall, type LineSpec, type OwnRefusals } from "./post";
import type { RunState } from "@/lib/runs/schemas";
import { REJECT_REASONS, UNDER_ONE_CAN, type HaulInput, type LossReason, type ProcessingInput, type RecyclingInput, type SortInput } from "./schemas";

// Writers of the ledger. Each reads what it needs first, without a lock, then
// makes one call of a ledger function (db/functions/), which locks the drive,
// re-checks what could have changed meanwhile and writes everything; so the
// drive's lock is held only inside the database. A writer joins the caller's
// transaction when given one (the Idempotency-Key helper's), else each
// statement commits on its own.

type Conn = Knex | Knex.Transaction;

/** A pickup-run stop the haul settles, in the same call (ledger_haul's p.stop). */
export interface HaulStop {
  runId: string;
  stopId: string;
}

/** What ledger_haul answers for a settled stop: when, and the run's state and counts after it. */
export interface SettledStop {
  resolvedAt: string;
  run: { state: RunState; stops: number; logged: number; skipped: number };
}

const HAUL_REFUSALS: OwnRefusals = {
  stopSettled: (d) => conflict(`This stop is already ${String(d.status)}.`),
};

export async function recordHaul(actor: Actor, driveId: string, input: HaulInput, conn: Conn) {
  return (await writeHaul(actor, driveId, input, conn)).haul;
}

/**
 * Logs a haul at a pickup-run stop and settles the stop in one call of
 * ledger_haul: the run is locked after the drive, a stop no longer pending is
 * a 409, and the run's state follows its stops. Only the run's volunteer or an
 * organiser may (404 otherwise, as for the run itself).
 */
export async function recordHaulAtStop(actor: Actor, driveId: string, input: HaulInput, at: HaulStop, conn: Conn) {
  const r = await writeHaul(actor, driveId, input, conn, at);
  return { haul: r.haul, settled: r.settled! };
}

async function writeHaul(actor: Actor, driveId: string, input: HaulInput, conn: Conn, at?: HaulStop) {
  const groupId = actor.group.id;
  // The drive, the drop point and the group's calibration in one read.
  const { rows } = await conn.raw(
    `select d.starts_on as "startsOn", p.id as point_id, p.name as point_name, p.capacity_bags, c.*
     from drives d
     left join drop_points p on p.id = ? and p.drive_id = d.id and p.group_id = d.group_id
     left join group_calibration c on c.group_id = d.group_id
     where d.id = ? and d.group_id = ?`,
    [input.dropPointId, driveId, groupId],
  );
  const row = rows[0];
  if (!row) throw notFound("That drive");
  if (!row.point_id) throw notFound("That drop point");
  const hauledAt = entryTimeOf({ happenedAt: input.happenedAt, legacy: input.hauledAt, legacyField: "hauledAt" }, row.startsOn);
  // Calibration is the group's, across drives; the estimate uses it as it stood when the haul arrived.
  const calibration = calibrationOfRow(row);
  const est = estimateHaulCans({ bags: input.bags, weightKg: input.weightKg ?? null }, calibration);
  // The schema's minimum uses the default can mass; a group whose counted cans
  // are heavier can still estimate a light weight at no cans.
  if (input.weightKg && est.cans === 0) throw new AppError("invalid_input", "Some fields need another look.", { fields: { weightKg: UNDER_ONE_CAN } });
  const byBags = estimateHaulCans({ bags: input.bags }, calibration);
  const weighed = est.method === "weight";
  askUnlessConfirmed(checkHaul({ bags: input.bags, capacityBags: row.capacity_bags, cansByWeight: weighed ? est.cans : null, cansPerBag: byBags.perUnit }), input.confirmUnusual);

  const haulId = randomUUID();
  const movementId = randomUUID();
  const lines: LineSpec[] = est.cans > 0 ? [{ from: null, to: "hauled", quantity: est.cans, dropPointId: row.point_id, isEstimate: true, haulId, note: input.note }] : [];
  const haul = {
    id: haulId,
    dropPointId: row.point_id,
    bags: input.bags,
    weightKg: input.weightKg ?? null,
    estimatedCans: est.cans,
    method: est.method,
    perUnit: est.perUnit,
    countedHauls: est.basis.countedHauls,
  };
  const stop = at ? { runId: at.runId, stopId: at.stopId, assigneeId: actor.role === "organiser" ? null : actor.user.id } : undefined;
  const payload = ledgerPayload({ groupId, driveId, actorId: actor.user.id, kind: "haul", occurredAt: hauledAt, movementId }, lines, { haul, stop });
  const r = await runLedgerFunction<{ stop?: SettledStop }>(conn, ledgerCall("ledger_haul", payload), HAUL_REFUSALS);
  const answer = {
    id: haulId,
    movementId,
    driveId,
    dropPointId: row.point_id as string,
    dropPointName: row.point_name as string,
    bags: input.bags,
    weightKg: input.weightKg ?? null,
    estimatedCans: est.cans,
    estimate: { method: est.method, perUnit: est.perUnit, countedHauls: est.basis.countedHauls, calibrated: est.basis.calibrated },
    hauledAt: hauledAt.toISOString(),
  };
  return { haul: answer, settled: r.stop };
}

const SORT_REFUSALS: OwnRefusals = {
  haulUndone: () => conflict("One of those hauls was undone; leave it out of the sort."),
  haulSorted: () => conflict("One of those hauls is already sorted; each haul is counted once."),
};

export async function recordSort(actor: Actor, driveId: string, input: SortInput, conn: Conn) {
  const groupId = actor.group.id;
  const { rows } = await conn.raw(
    `select d.starts_on as "startsOn",
            coalesce((select json_agg(json_build_object('id', h.id, 'drop_point_id', h.drop_point_id, 'bags', h.bags, 'weight_kg', h.weight_kg,
                                                        'estimated_cans', h.estimated_cans, 'sort_id', h.sort_id, 'reversed_at', h.reversed_at)
                                      order by h.hauled_at)
                      from hauls h where h.id = any (?::uuid[]) and h.group_id = d.group_id and h.drive_id = d.id), '[]') as hauls
     from drives d where d.id = ? and d.group_id = ?`,
    [input.haulIds, driveId, groupId],
  );
  if (!rows[0]) throw notFound("That drive");
  const hauls = rows[0].hauls as { id: string; drop_point_id: string; bags: number; weight_kg: number | null; estimated_cans: number; sort_id: string | null; reversed_at: string | null }[];
  if (hauls.length !== input.haulIds.length) throw notFound("One of those hauls");
  if (hauls.some((h) => h.reversed_at)) throw SORT_REFUSALS.haulUndone({});
  if (hauls.some((h) => h.sort_id)) throw SORT_REFUSALS.haulSorted({});

  const rejected = Object.fromEntries(REJECT_REASONS.map((r) => [r, input.rejected[r] ?? 0])) as Record<string, number>;
  const rejectedTotal = Object.values(rejected).reduce((s, n) => s + n, 0);
  const counted = input.good + rejectedTotal;
  const bags = hauls.reduce((s, h) => s + h.bags, 0);
  const allWeighed = hauls.every((h) => h.weight_kg !== null);
  const weightKg = allWeighed ? hauls.reduce((s, h) => s + (h.weight_kg ?? 0), 0) : null;
  const estimated = hauls.reduce((s, h) => s + h.estimated_cans, 0);
  askUnlessConfirmed(checkSort({ counted, estimated, bags, hauls: hauls.length }), input.confirmUnusual);
  const sortedAt = entryTimeOf({ happenedAt: input.happenedAt, legacy: input.sortedAt, legacyField: "sortedAt" }, rows[0].startsOn);
  const details = { good: input.good, rejected, counted, haulCount: hauls.length, bags, weightKg };

  const weights = hauls.map((h) => (h.estimated_cans > 0 ? h.estimated_cans : 1));
  const goodShare = allocate(input.good, weights);
  const rejectShares = Object.fromEntries(REJECT_REASONS.map((r) => [r, allocate(rejected[r], weights)]));

  const sortId = randomUUID();
  const movementId = randomUUID();
  const lines: LineSpec[] = [];
  hauls.forEach((h, i) => {
    const base = { dropPointId: h.drop_point_id, haulId: h.id, sortId, note: input.note };
    if (h.estimated_cans > 0) lines.push({ ...base, from: "hauled", to: null, quantity: h.estimated_cans, isEstimate: true });
    if (goodShare[i] > 0) lines.push({ ...base, from: null, to: "good", quantity: goodShare[i] });
    for (const r of REJECT_REASONS) {
      const n = rejectShares[r][i];
      if (n > 0) lines.push({ ...base, from: null, to: "rejected", quantity: n, reason: r });
    }
  });
  const sort = { id: sortId, haulIds: input.haulIds, good: input.good, rejected, counted, haulCount: hauls.length, bags, weightKg, calibration: calibrationDelta(details) };
  const payload = ledgerPayload({ groupId, driveId, actorId: actor.user.id, kind: "sort", occurredAt: sortedAt, movementId, details }, lines, { sort });
  await runLedgerFunction(conn, ledgerCall("ledger_sort", payload), SORT_REFUSALS);
  return {
    id: sortId,
    movementId,
    driveId,
    haulIds: input.haulIds,
    good: input.good,
    rejected,
    counted,
    closedEstimate: estimated,
    yield: counted > 0 ? input.good / counted : null,
    sortedAt: sortedAt.toISOString(),
  };
}

export type ProcessingResult = {
  movementId: string;
  driveId: string;
  from: ProcessingInput["from"];
  to: ProcessingInput["to"];
  quantity: number;
  /** Cans lost on the way (to `rejected` with the reason), or null. */
  lost: { reason: LossReason; quantity: number } | null;
  holesPerCan: number | null;
  holes: number | null;
  occurredAt: string;
};

/** The answer and the ledger call of a processing step; the movement id is chosen here, so the answer is known before the write. */
export async function prepareProcessing(actor: Actor, driveId: string, input: ProcessingInput, conn: Conn): Promise<{ answer: ProcessingResult; call: LedgerCall }> {
  const occurredAt = await resolveEntryTime(conn, { groupId: actor.group.id, driveId }, { happenedAt: input.happenedAt, legacy: input.occurredAt, legacyField: "occurredAt" });
  const holesPerCan = input.to === "punched" ? await drivesHolesPerCan(conn, actor.group.id, driveId) : null;
  const lost = input.lost ? { reason: input.lost.reason, quantity: input.lost.quantity } : null;
  const answer: ProcessingResult = {
    movementId: randomUUID(),
    driveId,
    from: input.from,
    to: input.to,
    quantity: input.quantity,
    lost,
    holesPerCan,
    holes: holesPerCan === null ? null : holesPerCan * input.quantity,
    occurredAt: occurredAt.toISOString(),
  };
  // Lost cans leave `from` in the same movement, so ledger_post checks `from` for quantity + lost at once.
  const lines: LineSpec[] = [];
  if (input.quantity > 0) lines.push({ from: input.from, to: input.to, quantity: input.quantity, note: input.note });
  if (lost) lines.push({ from: input.from, to: "rejected", quantity: lost.quantity, reason: lost.reason, note: input.note });
  const details = lost ? { from: input.from, to: input.to, quantity: input.quantity, lost } : { from: input.from, to: input.to, quantity: input.quantity };
  const call = ledgerPostCall({ groupId: actor.group.id, driveId, actorId: actor.user.id, kind: "processing", occurredAt, movementId: answer.movementId, details }, lines);
  return { answer, call };
}

export async function recordProcessing(actor: Actor, driveId: string, input: ProcessingInput, conn: Conn): Promise<ProcessingResult> {
  const { answer, call } = await prepareProcessing(actor, driveId, input, conn);
  await runLedgerCall(conn, call);
  return answer;
}

/** Holes per can most of the drive's units use; 4 when it has none. */
export async function drivesHolesPerCan(conn: Conn, groupId: string, driveId: string): Promise<number> {
  const row = (await conn("heater_units")
    .select("holes_per_can")
    .count({ n: "*" })
    .where({ drive_id: driveId, group_id: groupId })
    .groupBy("holes_per_can")
    .orderBy([{ column: "n", order: "desc" }, { column: "holes_per_can", order: "desc" }])
    .first()) as { holes_per_can: number } | undefined;
  return row ? row.holes_per_can : 4;
}

export async function recordRecycling(actor: Actor, driveId: string, input: RecyclingInput, conn: Conn) {
  const groupId = actor.group.id;
  const occurredAt = input.occurredAt ? new Date(input.occurredAt) : new Date();
  const details = { weightKg: input.weightKg ?? null, moneyReceived: input.moneyReceived ?? null };
  const { movementId } = await postMovement(conn, { groupId, driveId, actorId: actor.user.id, kind: "recycling", occurredAt, details }, [
    { from: "rejected", to: "recycled", quantity: input.quantity, note: input.note },
  ]);
  return { movementId, driveId, quantity: input.quantity, ...details, occurredAt: occurredAt.toISOString() };
}

