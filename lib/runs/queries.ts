import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { planRoute } from "@/lib/routes/route";
import type { CreateRunInput, RunState, StopStatus } from "./schemas";
import { runStateOf } from "./state";

export interface RunSummary {
  id: string;
  driveId: string;
  driveName: string;
  plannedOn: string;
  state: RunState;
  distanceKm: number;
  assigneeId: string | null;
  assigneeName: string | null;
  stops: number;
  logged: number;
  skipped: number;
}

const summaryColumns = (k: Knex) => [
  "r.id",
  "r.drive_id as driveId",
  "d.name as driveName",
  k.raw(`to_char(r.planned_on, 'YYYY-MM-DD') as "plannedOn"`),
  "r.state",
  "r.distance_km as distanceKm",
  "r.assignee_id as assigneeId",
  "u.name as assigneeName",
  k.raw(`(select count(*)::int from pickup_run_stops s where s.run_id = r.id) as stops`),
  k.raw(`(select count(*)::int from pickup_run_stops s where s.run_id = r.id and s.status = 'logged') as logged`),
  k.raw(`(select count(*)::int from pickup_run_stops s where s.run_id = r.id and s.status = 'skipped') as skipped`),
];

/** The group's runs; a volunteer sees only the runs given to them. */
export async function listRuns(actor: Actor): Promise<RunSummary[]> {
  return db("pickup_runs as r")
    .join("drives as d", "d.id", "r.drive_id")
    .leftJoin("users as u", "u.id", "r.assignee_id")
    .select(summaryColumns(db))
    .where("r.group_id", actor.group.id)
    .modify((q) => {
      if (actor.role !== "organiser") q.andWhere("r.assignee_id", actor.user.id);
    })
    .orderBy([{ column: "r.planned_on", order: "desc" }, { column: "r.created_at", order: "desc" }]);
}

export interface RunStop {
  id: string;
  position: number;
  legKm: number;
  status: StopStatus;
  skipReason: string | null;
  haulId: string | null;
  resolvedAt: string | null;
  /** `movementId` is the ledger entry to undo (POST /api/movements/{id}/reversal), which reopens the stop. */
  haul: { bags: number; weightKg: number | null; estimatedCans: number; movementId: string } | null;
  dropPoint: {
    id: string;
    name: string;
    address: string;
    lat: number;
    lng: number;
    hours: string;
    accessNotes: string;
    hostName: string | null;
    hostPhone: string | null;
    hostEmail: string | null;
    capacityBags: number;
  };
}

export interface RunDetail extends RunSummary {
  driveSlug: string;
  start: { lat: number; lng: number };
  returnToStart: boolean;
  notes: string;
  createdByName: string | null;
  stopList: RunStop[];
}

/** One run of the acting group; a volunteer may only open the runs given to them (else 404). */
export async function getRun(actor: Actor, runId: string, trx: Knex = db): Promise<RunDetail> {
  const run = await trx("pickup_runs as r")
    .join("drives as d", "d.id", "r.drive_id")
    .leftJoin("users as u", "u.id", "r.assignee_id")
    .leftJoin("users as c", "c.id", "r.created_by")
    .select(summaryColumns(trx))
    .select("d.slug as driveSlug", "r.start_lat", "r.start_lng", "r.return_to_start as returnToStart", "r.notes", "c.name as createdByName")
    .where({ "r.id": runId, "r.group_id": actor.group.id })
    .modify((q) => {
      if (actor.role !== "organiser") q.andWhere("r.assignee_id", actor.user.id);
    })
    .first();
  if (!run) throw notFound("That pickup run");
  const stops = await trx("pickup_run_stops as s")
    .join("drop_points as p", "p.id", "s.drop_point_id")
    .leftJoin("hauls as h", "h.id", "s.haul_id")
    .select(
      "h.bags as haulBags",
      "h.weight_kg as haulWeightKg",
      "h.estimated_cans as haulCans",
      "h.movement_id as haulMovementId",
      "s.id",
      "s.position",
      "s.leg_km as legKm",
      "s.status",
      "s.skip_reason as skipReason",
      "s.haul_id as haulId",
      "s.resolved_at as resolvedAt",
      "p.id as pointId",
      "p.name",
      "p.address",
      "p.lat",
      "p.lng",
      "p.hours",
      "p.access_notes as accessNotes",
      "p.host_name as hostName",
      "p.host_phone as hostPhone",
      "p.host_email as hostEmail",
      "p.capacity_bags as capacityBags",
    )
    .where({ "s.run_id": runId, "s.group_id": actor.group.id })
    .orderBy("s.position");
  const { start_lat, start_lng, ...rest } = run;
  return {
    ...rest,
    start: { lat: start_lat, lng: start_lng },
    stopList: stops.map((s) => ({
      id: s.id,
      position: s.position,
      legKm: s.legKm,
      status: s.status,
      skipReason: s.skipReason,
      haulId: s.haulId,
      resolvedAt: s.resolvedAt ? new Date(s.resolvedAt).toISOString() : null,
      haul: s.haulId
        ? { bags: s.haulBags, weightKg: s.haulWeightKg === null ? null : Number(s.haulWeightKg), estimatedCans: s.haulCans, movementId: s.haulMovementId }
        : null,
      dropPoint: {
        id: s.pointId,
        name: s.name,
        address: s.address,
        lat: s.lat,
        lng: s.lng,
        hours: s.hours,
        accessNotes: s.accessNotes,
        hostName: s.hostName,
        hostPhone: s.hostPhone,
        hostEmail: s.hostEmail,
        capacityBags: s.capacityBags,
      },
    })),
  };
}

/** Members who can drive a run: volunteers and organisers of the group. */
export async function listDrivers(groupId: string) {
  return db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .select("u.id", "u.name", "u.email", "m.role")
    .where("m.group_id", groupId)
    .whereIn("m.role", ["volunteer", "organiser"])
    .orderBy([{ column: "m.role", order: "desc" }, { column: "u.name" }]);
}

/** Orders the chosen drop points and stores the run; the caller sends the e-mail after commit. */
export async function createRun(actor: Actor, input: CreateRunInput) {
  return db.transaction(async (trx) => {
    const drive = await trx("drives").select("id", "name").where({ id: input.driveId, group_id: actor.group.id }).first();
    if (!drive) throw notFound("That drive");
    const points = await trx("drop_points")
      .select("id", "name", "lat", "lng")
      .where({ group_id: actor.group.id, drive_id: drive.id })
      .whereIn("id", input.dropPointIds);
    if (points.length !== input.dropPointIds.length) {
      throw new AppError("invalid_input", "Some chosen drop points are not part of this drive.", {
        fields: { dropPointIds: "Choose drop points of this drive only" },
      });
    }
    const assignee = await trx("memberships as m")
      .join("users as u", "u.id", "m.user_id")
      .select("u.id", "u.name", "u.email")
      .where({ "m.group_id": actor.group.id, "m.user_id": input.assigneeId })
      .whereIn("m.role", ["volunteer", "organiser"])
      .first();
    if (!assignee) {
      throw new AppError("invalid_input", "That person cannot take this run.", {
        fields: { assigneeId: "Choose a volunteer or organiser of your group" },
      });
    }
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
export async function lockPendingStop(actor: Actor, runId: string, stopId: string, trx: Knex.Transaction) {
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
 * Marks one stop logged or skipped, then moves the run's state along. Only the
 * run's volunteer or an organiser may; a stop already settled is a 409.
 */
export async function resolveStop(
  actor: Actor,
  runId: string,
  stopId: string,
  change: { status: "skipped"; reason: string } | { status: "logged"; haulId: string },
  trx: Knex.Transaction,
  /** What lockPendingStop already returned in this transaction, so it is not locked and read twice. */
  locked?: Awaited<ReturnType<typeof lockPendingStop>>,
) {
  const { run, stop } = locked ?? (await lockPendingStop(actor, runId, stopId, trx));
  if (change.status === "logged") {
    // Two runs logging one haul lock different runs; locking the haul makes
    // the second wait for the first and then see the stop it settled.
    await trx("hauls").select("id").where({ id: change.haulId, group_id: actor.group.id }).forUpdate().first();
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
      resolved_at: trx.fn.now(),
    })
    .catch((error: unknown) => {
      // The unique index is the last word if anything slips past the lock.
      if (isUniqueViolation(error, "pickup_run_stops_haul_unique")) throw conflict(HAUL_TAKEN);
      throw error;
    });
  const statuses: StopStatus[] = await trx("pickup_run_stops").where({ run_id: runId }).pluck("status");
  const state = runStateOf(statuses);
  await trx("pickup_runs")
    .where({ id: runId })
    .update({
      state,
      started_at: run.started_at ?? trx.fn.now(),
      finished_at: state === "done" ? trx.fn.now() : null,
    });
  return { dropPointId: stop.dropPointId, state };
}
