import "server-only";
import { AppError, conflict } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { db } from "@/lib/db";
import { runLedgerFunction, type OwnRefusals } from "@/lib/ledger/post";
import { runDriver } from "./commands";
import { legsInOrder, reoptimisedOrder } from "./run-edit-plan";
import { CLOSED_RUN_STATES, RUN_STATE_LABEL, type CancelRunInput, type EditRunInput } from "./schemas";
import type { RunDetail } from "./types";

// A pickup run's edits and its cancel (issue 16). Each reads the run as the
// route resolved it (unlocked), checks the input for clear messages, works out
// the new order and legs, then makes ONE call of a database function
// (db/functions/pickup_runs.sql) that takes the drive's and the run's locks and
// re-checks the state, so an edit never crosses a haul or an undo at a stop.

const REFUSALS: OwnRefusals = {
  runClosed: (d) => closedRun(String(d.state)),
  stopSettled: () => conflict("A stop already logged or skipped stays on the run: it is part of the record."),
  stopsChanged: () => conflict("The run's stops changed meanwhile: reload the run and try again."),
};

function closedRun(state: string) {
  const label = RUN_STATE_LABEL[state as keyof typeof RUN_STATE_LABEL] ?? state;
  return conflict(`This run is ${label.toLowerCase()}: it can no longer be changed.`, { state });
}

function assertOpen(run: RunDetail) {
  if (CLOSED_RUN_STATES.includes(run.state)) throw closedRun(run.state);
}

async function callEdit(actor: Actor, run: RunDetail, change: Record<string, unknown>) {
  return runLedgerFunction<{ state: string }>(
    db,
    { sql: "pickup_run_edit(?::jsonb)", bindings: [JSON.stringify({ groupId: actor.group.id, driveId: run.driveId, runId: run.id, ...change })] },
    REFUSALS,
  );
}

/**
 * Changes the date, the volunteer or the notes. Answers what changed, so the
 * route can mail the people concerned after commit: the new volunteer gets the
 * run, the one taken off is told; a new date is mailed to the volunteer.
 */
export async function editRun(actor: Actor, run: RunDetail, input: EditRunInput) {
  assertOpen(run);
  const change: Record<string, unknown> = {};
  if (input.plannedOn !== undefined && input.plannedOn !== run.plannedOn) change.plannedOn = input.plannedOn;
  if (input.notes !== undefined && input.notes !== run.notes) change.notes = input.notes;
  let newDriver: { id: string; name: string; email: string } | null = null;
  if (input.assigneeId !== undefined && input.assigneeId !== run.assigneeId) {
    newDriver = await runDriver(db, actor.group.id, input.assigneeId);
    change.assigneeId = newDriver.id;
  }
  if (Object.keys(change).length === 0) return { changed: false as const };
  await callEdit(actor, run, change);
  const oldDriver = newDriver && run.assigneeId
    ? ((await db("users").select("id", "name", "email").where({ id: run.assigneeId }).first()) as { id: string; name: string; email: string } | undefined) ?? null
    : null;
  return { changed: true as const, dateChanged: "plannedOn" in change, newDriver, oldDriver };
}

async function pointsOf(actor: Actor, run: RunDetail, ids: readonly string[]) {
  const rows = await db("drop_points")
    .select("id", "lat", "lng")
    .where({ group_id: actor.group.id, drive_id: run.driveId })
    .whereIn("id", ids as string[]);
  if (rows.length !== ids.length) {
    throw new AppError("invalid_input", "Some chosen drop points are not part of this run's drive.", {
      fields: { dropPointIds: "Choose drop points of this drive only" },
    });
  }
  return new Map(rows.map((r) => [r.id as string, { dropPointId: r.id as string, lat: r.lat as number, lng: r.lng as number }]));
}

/** Stores the run's drop points in this visiting order: new ones are added, missing pending ones removed, legs recomputed. */
async function storeOrder(actor: Actor, run: RunDetail, order: readonly string[]) {
  const points = await pointsOf(actor, run, order);
  const stopOf = new Map(run.stopList.map((s) => [s.dropPoint.id, s]));
  for (const s of run.stopList) {
    if (s.status !== "pending" && !order.includes(s.dropPoint.id)) {
      throw conflict(`${s.dropPoint.name} is ${s.status === "logged" ? "logged" : s.status}: a stop already settled stays on the run.`);
    }
  }
  const placed = order.map((id) => points.get(id)!);
  const { legs, distanceKm } = legsInOrder(run.start, placed, run.returnToStart);
  const stops = order.map((id, i) => ({ id: stopOf.get(id)?.id ?? null, dropPointId: id, legKm: legs[i] }));
  await callEdit(actor, run, { stops, distanceKm });
  return { distanceKm };
}

/** PUT /api/runs/{id}/stops: add, remove and reorder by hand in one. */
export async function setStops(actor: Actor, run: RunDetail, dropPointIds: readonly string[]) {
  assertOpen(run);
  return storeOrder(actor, run, dropPointIds);
}

/** POST /api/runs/{id}/optimise: the stops still to visit in the route planner's shortest order. */
export async function optimiseRun(actor: Actor, run: RunDetail) {
  assertOpen(run);
  const order = reoptimisedOrder(
    run.start,
    run.stopList.map((s) => ({ dropPointId: s.dropPoint.id, lat: s.dropPoint.lat, lng: s.dropPoint.lng, status: s.status })),
    run.returnToStart,
  );
  return storeOrder(actor, run, order);
}

/** POST /api/runs/{id}/cancel: the run stays, cancelled, with its history; its pending stops are released. */
export async function cancelRun(actor: Actor, run: RunDetail, input: CancelRunInput) {
  assertOpen(run);
  return runLedgerFunction<{ state: "cancelled"; released: number }>(
    db,
    {
      sql: "pickup_run_cancel(?::jsonb)",
      bindings: [JSON.stringify({ groupId: actor.group.id, driveId: run.driveId, runId: run.id, actorId: actor.user.id, reason: input.reason })],
    },
    REFUSALS,
  );
}
