import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { isOpenOnDate, type OpeningHours } from "@/lib/drives/opening-hours";
import type { RunDetail, RunStop, RunSummary } from "./types";
import { closedStopWarnings } from "./warnings";

export type { RunDetail, RunStop, RunSummary };

const summaryColumns = (k: Knex) => [
  "r.id",
  "r.drive_id as driveId",
  "d.name as driveName",
  "r.planned_on as plannedOn",
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

/** One run of the acting group; a volunteer may only open the runs given to them (else 404). */
export async function getRun(actor: Actor, runId: string, trx: Knex = db): Promise<RunDetail> {
  const run = await trx("pickup_runs as r")
    .join("drives as d", "d.id", "r.drive_id")
    .leftJoin("users as u", "u.id", "r.assignee_id")
    .leftJoin("users as c", "c.id", "r.created_by")
    .leftJoin("users as x", "x.id", "r.cancelled_by")
    .select(summaryColumns(trx))
    .select(
      "d.slug as driveSlug",
      "r.start_lat",
      "r.start_lng",
      "r.return_to_start as returnToStart",
      "r.notes",
      "c.name as createdByName",
      "r.cancelled_at",
      "r.cancel_reason as cancelReason",
      "x.name as cancelledByName",
    )
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
      "p.opening_hours as openingHours",
    )
    .where({ "s.run_id": runId, "s.group_id": actor.group.id })
    .orderBy("s.position");
  const { start_lat, start_lng, cancelled_at, ...rest } = run;
  const detail: Omit<RunDetail, "warnings"> = {
    ...rest,
    cancelledAt: cancelled_at ? new Date(cancelled_at).toISOString() : null,
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
        ? { bags: s.haulBags, weightKg: s.haulWeightKg, estimatedCans: s.haulCans, movementId: s.haulMovementId }
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
        openingHours: (s.openingHours ?? []) as OpeningHours,
      },
      openOnRunDay: isOpenOnDate(s.openingHours as OpeningHours, run.plannedOn as string),
    })),
  };
  return { ...detail, warnings: closedStopWarnings(detail) };
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
