import { randomUUID } from "node:crypto";
import type { Knex } from "knex";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { estimateHaulCans } from "./estimate";
import { allocate } from "./allocate";
import { loadCalibration, calibrationDelta, applyCalibration } from "./calibration";
import { resolveEntryTime } from "./entry-time-query";
import { askUnlessConfirmed, checkHaul, checkSort } from "./plausibility";
import { bumpDropPoint, inTx, ledgerPostCall, lockDrive, postMovement, runLedgerCall, type LedgerCall, type LineSpec } from "./post";
import { REJECT_REASONS, UNDER_ONE_CAN, type HaulInput, type LossReason, type ProcessingInput, type RecyclingInput, type SortInput } from "./schemas";

// Writers of the ledger. Each is one transaction (or joins the caller's, as
// the Idempotency-Key helper does). ledger_post locks the drive and checks the
// group itself; a writer that reads other rows first (hauls, sorts) locks the
// drive before those reads with lockDrive.

type Conn = Knex | Knex.Transaction;

export async function recordHaul(actor: Actor, driveId: string, input: HaulInput, conn: Conn) {
  return inTx(conn, async (trx) => {
    const groupId = actor.group.id;
    await lockDrive(trx, groupId, driveId);
    const point = await trx("drop_points").select("id", "name", "capacity_bags").where({ id: input.dropPointId, drive_id: driveId, group_id: groupId }).first();
    if (!point) throw notFound("That drop point");
    const hauledAt = await resolveEntryTime(trx, { groupId, driveId }, { happenedAt: input.happenedAt, legacy: input.hauledAt, legacyField: "hauledAt" });
    const calibration = await loadCalibration(trx, groupId);
    const est = estimateHaulCans({ bags: input.bags, weightKg: input.weightKg ?? null }, calibration);
    // The schema's minimum uses the default can mass; a group whose counted cans
    // are heavier can still estimate a light weight at no cans.
    if (input.weightKg && est.cans === 0) throw new AppError("invalid_input", "Some fields need another look.", { fields: { weightKg: UNDER_ONE_CAN } });
    const byBags = estimateHaulCans({ bags: input.bags }, calibration);
    const weighed = est.method === "weight";
    askUnlessConfirmed(checkHaul({ bags: input.bags, capacityBags: point.capacity_bags, cansByWeight: weighed ? est.cans : null, cansPerBag: byBags.perUnit }), input.confirmUnusual);

    const [movement] = await trx("movements")
      .insert({ group_id: groupId, drive_id: driveId, kind: "haul", recorded_by: actor.user.id, occurred_at: hauledAt, details: "{}" })
      .returning("id");
    const [haul] = await trx("hauls")
      .insert({
        group_id: groupId,
        drive_id: driveId,
        drop_point_id: point.id,
        movement_id: movement.id,
        bags: input.bags,
        weight_kg: input.weightKg ?? null,
        estimated_cans: est.cans,
        estimate_method: est.method,
        estimate_per_unit: est.perUnit,
        estimate_counted_hauls: est.basis.countedHauls,
        hauled_at: hauledAt,
        recorded_by: actor.user.id,
      })
      .returning(["id", "hauled_at"]);
    if (est.cans > 0) {
      await postLinesOnly(trx, movement.id, { groupId, driveId, actorId: actor.user.id, occurredAt: hauledAt }, [
        { from: null, to: "hauled", quantity: est.cans, dropPointId: point.id, isEstimate: true, haulId: haul.id, note: input.note },
      ]);
    }
    await bumpDropPoint(trx, groupId, driveId, point.id, { hauls: 1, bags: input.bags });
    return {
      id: haul.id as string,
      movementId: movement.id as string,
      driveId,
      dropPointId: point.id as string,
      dropPointName: point.name as string,
      bags: input.bags,
      weightKg: input.weightKg ?? null,
      estimatedCans: est.cans,
      estimate: { method: est.method, perUnit: est.perUnit, countedHauls: est.basis.countedHauls, calibrated: est.basis.calibrated },
      hauledAt: new Date(haul.hauled_at).toISOString(),
    };
  });
}

/**
 * A haul's movement row is written before the haul (the haul refers to it),
 * so its lines go through postMovement's checks with the movement already in place.
 */
async function postLinesOnly(
  trx: Knex.Transaction,
  movementId: string,
  m: { groupId: string; driveId: string; actorId: string; occurredAt: Date },
  lines: LineSpec[],
) {
  return postMovement(trx, { ...m, kind: "haul", existingMovementId: movementId }, lines);
}

export async function recordSort(actor: Actor, driveId: string, input: SortInput, conn: Conn) {
  return inTx(conn, async (trx) => {
    const groupId = actor.group.id;
    await lockDrive(trx, groupId, driveId);
    const hauls = await trx("hauls")
      .select("id", "drop_point_id", "bags", "weight_kg", "estimated_cans", "sort_id", "reversed_at")
      .whereIn("id", input.haulIds)
      .andWhere({ group_id: groupId, drive_id: driveId })
      .orderBy("hauled_at");
    if (hauls.length !== input.haulIds.length) throw notFound("One of those hauls");
    if (hauls.some((h) => h.reversed_at)) throw conflict("One of those hauls was undone; leave it out of the sort.");
    if (hauls.some((h) => h.sort_id)) throw conflict("One of those hauls is already sorted; each haul is counted once.");

    const rejected = Object.fromEntries(REJECT_REASONS.map((r) => [r, input.rejected[r] ?? 0])) as Record<string, number>;
    const rejectedTotal = Object.values(rejected).reduce((s, n) => s + n, 0);
    const counted = input.good + rejectedTotal;
    const bags = hauls.reduce((s, h) => s + h.bags, 0);
    const allWeighed = hauls.every((h) => h.weight_kg !== null);
    const weightKg = allWeighed ? hauls.reduce((s, h) => s + Number(h.weight_kg), 0) : null;
    const estimated = hauls.reduce((s, h) => s + h.estimated_cans, 0);
    askUnlessConfirmed(checkSort({ counted, estimated, bags, hauls: hauls.length }), input.confirmUnusual);
    const sortedAt = await resolveEntryTime(trx, { groupId, driveId }, { happenedAt: input.happenedAt, legacy: input.sortedAt, legacyField: "sortedAt" });
    const details = { good: input.good, rejected, counted, haulCount: hauls.length, bags, weightKg };

    const weights = hauls.map((h) => (h.estimated_cans > 0 ? h.estimated_cans : 1));
    const goodShare = allocate(input.good, weights);
    const rejectShares = Object.fromEntries(REJECT_REASONS.map((r) => [r, allocate(rejected[r], weights)]));

    const { movementId, sortId } = await postSort(trx, { groupId, driveId, actor, sortedAt, details, note: input.note }, hauls, goodShare, rejectShares);
    await trx("hauls").whereIn("id", input.haulIds).update({ sort_id: sortId });
    await applyCalibration(trx, groupId, calibrationDelta(details), 1);
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
  });
}

async function postSort(
  trx: Knex.Transaction,
  s: { groupId: string; driveId: string; actor: Actor; sortedAt: Date; details: { good: number; rejected: Record<string, number>; counted: number; haulCount: number; bags: number; weightKg: number | null }; note?: string },
  hauls: { id: string; drop_point_id: string; estimated_cans: number }[],
  goodShare: number[],
  rejectShares: Record<string, number[]>,
) {
  const [movement] = await trx("movements")
    .insert({ group_id: s.groupId, drive_id: s.driveId, kind: "sort", recorded_by: s.actor.user.id, occurred_at: s.sortedAt, details: JSON.stringify(s.details) })
    .returning("id");
  const [sort] = await trx("sorts")
    .insert({
      group_id: s.groupId,
      drive_id: s.driveId,
      movement_id: movement.id,
      good: s.details.good,
      rejected: JSON.stringify(s.details.rejected),
      counted: s.details.counted,
      haul_count: s.details.haulCount,
      bags: s.details.bags,
      weight_kg: s.details.weightKg,
      sorted_at: s.sortedAt,
      recorded_by: s.actor.user.id,
    })
    .returning("id");
  const lines: LineSpec[] = [];
  hauls.forEach((h, i) => {
    const base = { dropPointId: h.drop_point_id, haulId: h.id, sortId: sort.id as string, note: s.note };
    if (h.estimated_cans > 0) lines.push({ ...base, from: "hauled", to: null, quantity: h.estimated_cans, isEstimate: true });
    if (goodShare[i] > 0) lines.push({ ...base, from: null, to: "good", quantity: goodShare[i] });
    for (const r of REJECT_REASONS) {
      const n = rejectShares[r][i];
      if (n > 0) lines.push({ ...base, from: null, to: "rejected", quantity: n, reason: r });
    }
  });
  await postMovement(trx, { groupId: s.groupId, driveId: s.driveId, actorId: s.actor.user.id, kind: "sort", occurredAt: s.sortedAt, existingMovementId: movement.id }, lines);
  return { movementId: movement.id as string, sortId: sort.id as string };
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
  return row ? Number(row.holes_per_can) : 4;
}

export async function recordRecycling(actor: Actor, driveId: string, input: RecyclingInput, conn: Conn) {
  return inTx(conn, async (trx) => {
    const groupId = actor.group.id;
    const occurredAt = input.occurredAt ? new Date(input.occurredAt) : new Date();
    const details = { weightKg: input.weightKg ?? null, moneyReceived: input.moneyReceived ?? null };
    const { movementId } = await postMovement(trx, { groupId, driveId, actorId: actor.user.id, kind: "recycling", occurredAt, details }, [
      { from: "rejected", to: "recycled", quantity: input.quantity, note: input.note },
    ]);
    return { movementId, driveId, quantity: input.quantity, ...details, occurredAt: occurredAt.toISOString() };
  });
}

