import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { AppError, conflict, invalidInput, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { recordHaulAtStop } from "@/lib/ledger/record";
import { haulInputSchema } from "@/lib/ledger/schemas";
import { planRoute } from "@/lib/runs/route-order";
import type { CreateRunInput } from "./schemas";
import { followStops } from "./stop-follow";
import { groupTimeZone } from "@/lib/format/group-look-queries";
import type { RunDetail, RunStop } from "./types";
import { haulDayWarning } from "./warnings";

// The pickup runs' writes: a new run, and settling its stops. Reads are in queries.ts.

/** The group's volunteer or organiser who may take a run (422 for anyone else, another group's people included). */
export async function runDriver(q: Knex | Knex.Transaction, groupId: string, userId: string): Promise<{ id: string; name: string; email: string }> {
  const person = await q("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .select("u.id", "u.name", "u.email")
    .where({ "m.group_id": groupId, "m.user_id": userId })
    .whereIn("m.role", ["volunteer", "organiser"])
    .first();
  if (!person) {
    throw new AppError("invalid_input", "That person cannot take this run.", { fields: { assigneeId: "Choose a volunteer or organiser of your group" } });
  }
  return person as { id: string; name: string; email: string };
}

/** Orders the chosen drop points and stores the run; the caller sends the e-mail after commit. */
export async function createRun(actor: Actor, input: CreateRunInput) {
  return db.transaction(async (trx) => {
    // An archived drive or drop point is out of every plan (restore it first).
    const drive = await trx("drives").select("id", "name").where({ id: input.driveId, group_id: actor.group.id }).whereNull("archived_at").first();
    if (!drive) throw notFound("That drive");
    const points = await trx("drop_points")
      .select("id", "name", "lat", "lng")
      .where({ group_id: actor.group.id, drive_id: drive.id })
      .whereNull("archived_at")
      .whereIn("id", input.dropPointIds);
    if (points.length !== input.dropPointIds.length) {
      throw new AppError("invalid_input", "Some chosen drop points are not part of this drive.", {
        fields: { dropPointIds: "Choose drop points of this drive only" },
      });
    }
    const assignee = await runDriver(trx, actor.group.id, input.assigneeId);
    const plan = planRoute({ start: input.start, stops: points, returnToStart: input.returnToStart });
    const [run] = await trx("pickup_runs")
      .insert({
        group_id: actor.group.id,
        drive_id: drive.id,
        planned_on: input.plannedOn,
        start_lat: input.start.lat,
        start_lng: input.start.lng,
        return_to_start: input.returnToStart,
        distance_km: plan.distanceKm,
        assignee_id: assignee.id,
        notes: input.notes,
        created_by: actor.user.id,
      })
      .returning(["id"]);
    await trx("pickup_run_stops").insert(
      plan.order.map((pointId, i) => ({
        run_id: run.id,
        group_id: actor.group.id,
        drop_point_id: pointId,
        position: i + 1,
        leg_km: plan.legs[i]!.km,
      })),
    );
    const byId = new Map(points.map((p) => [p.id as string, p.name as string]));
    return { id: run.id as string, drive, assignee, plan, stopNames: plan.order.map((id) => byId.get(id)!) };
  });
}

/** Locks the run and returns the stop if the actor may settle it and it is still pending. */
async function lockPendingStop(actor: Actor, runId: string, stopId: string, trx: Knex.Transaction) {
  const run = await trx("pickup_runs")
    .select("id", "assignee_id", "started_at")
    .where({ id: runId, group_id: actor.group.id })
    .forUpdate()
    .first();
  if (!run || (actor.role !== "organiser" && run.assignee_id !== actor.user.id)) throw notFound("That pickup run");
  const stop = await trx("pickup_run_stops")
    .select("id", "status", "drop_point_id")
    .where({ id: stopId, run_id: runId, group_id: actor.group.id })
    .first();
  if (!stop) throw notFound("That stop");
  if (stop.status !== "pending") throw conflict(`This stop is already ${stop.status}.`);
  return { run, stop: { id: stop.id as string, dropPointId: stop.drop_point_id as string } };
}

const HAUL_TAKEN = "That haul already settles another stop.";

function isUniqueViolation(error: unknown, constraint: string): boolean {
  const e = error as { code?: string; constraint?: string } | null;
  return e?.code === "23505" && e.constraint === constraint;
}

/**
 * Logs a haul at a stop of `before` (the run as read for the request, without
 * a lock) and settles the stop: the body is the haul's (same rules and
 * estimate as POST /api/drives/{id}/hauls), a stop already settled is a 409
 * before anything is written. The haul, the stop and the run's state are
 * written by one call of ledger_haul (which re-checks the stop under the
 * run's lock, taken after the drive's), so the drive's lock is never held
 * across a round trip; the answer is `before` with the stop settled and the
 * run's state and counts as that call left them.
 */
export async function logHaulAtStop(actor: Actor, before: RunDetail, stopId: string, body: Record<string, unknown>, trx: Knex.Transaction) {
  const stop = before.stopList.find((s) => s.id === stopId);
  if (!stop) throw notFound("That stop");
  const parsed = haulInputSchema.safeParse({ ...body, dropPointId: stop.dropPoint.id });
  if (!parsed.success) throw invalidInput(parsed.error);
  if (stop.status !== "pending") throw conflict(`This stop is already ${stop.status}.`);
  const timeZone = await groupTimeZone(actor.group.id);
  const { haul, settled } = await recordHaulAtStop(actor, before.driveId, parsed.data, { runId: before.id, stopId }, trx);
  const logged: RunStop = {
    ...stop,
    status: "logged",
    skipReason: null,
    haulId: haul.id,
    resolvedAt: new Date(settled.resolvedAt).toISOString(),
    haul: { bags: haul.bags, weightKg: haul.weightKg, estimatedCans: haul.estimatedCans, movementId: haul.movementId },
  };
  const run: RunDetail = { ...before, ...settled.run, stopList: before.stopList.map((s) => (s.id === stopId ? logged : s)) };
  // A warning, never a block: the haul is logged whatever the day (issue 16).
  return { haul, run, warnings: haulDayWarning(before.plannedOn, new Date(haul.hauledAt), timeZone, stopId) };
}

/**
 * Marks one stop logged or skipped, then moves the run's state along. Only the
 * run's volunteer or an organiser may; a stop already settled is a 409.
 */
export async function resolveStop(
  actor: Actor,
  runId: string,
  stopId: string,
  change: { status: "skipped"; reason: string; at?: Date } | { status: "logged"; haulId: string },
  trx: Knex.Transaction,
) {
  if (change.status === "logged") {
    // Two runs logging one haul lock different runs; locking the haul makes
    // the second wait for the first and then see the stop it settled. The haul
    // is locked before the run, the order an undo takes them in (ledger_reverse:
    // drive, haul, then the run of the stop it reopens), so the two cannot deadlock.
    await trx("hauls").select("id").where({ id: change.haulId, group_id: actor.group.id }).forUpdate().first();
  }
  const { stop } = await lockPendingStop(actor, runId, stopId, trx);
  if (change.status === "logged") {
    const taken = await trx("pickup_run_stops").select("id").where({ haul_id: change.haulId }).first();
    if (taken) throw conflict(HAUL_TAKEN);
  }
  await trx("pickup_run_stops")
    .where({ id: stopId })
    .update({
      status: change.status,
      skip_reason: change.status === "skipped" ? change.reason : null,
      haul_id: change.status === "logged" ? change.haulId : null,
      resolved_by: actor.user.id,
      // A skip entered with no signal carries the time it was entered (checked by the route).
      resolved_at: change.status === "skipped" && change.at ? change.at : trx.fn.now(),
    })
    .catch((error: unknown) => {
      // The unique index is the last word if anything slips past the lock.
      if (isUniqueViolation(error, "pickup_run_stops_haul_unique")) throw conflict(HAUL_TAKEN);
      throw error;
    });
  const state = await followStops(trx, runId, true);
  return { dropPointId: stop.dropPointId, state };
}
