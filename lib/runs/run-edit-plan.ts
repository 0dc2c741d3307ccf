/**
 * A pickup run's stops after an edit: the legs of an order chosen by hand, and
 * a re-optimised order that keeps the stops already settled where they are.
 * Pure (no database): the route planner (route-order.ts) and great-circle
 * distances (great-circle.ts) do the maths; lib/runs/edit.ts stores the result.
 */
import { haversineKm, type LatLng } from "./great-circle";
import { planRoute } from "./route-order";
import type { StopStatus } from "./schemas";

export interface PlacedStop extends LatLng {
  /** The drop point's id: a run visits a drop point once. */
  dropPointId: string;
}

/** The leg into each stop in the given order, and the total (with the way back when the run returns to its start). */
export function legsInOrder(start: LatLng, stops: readonly PlacedStop[], returnToStart: boolean) {
  let prev: LatLng = start;
  const legs = stops.map((s) => {
    const km = haversineKm(prev, s);
    prev = s;
    return km;
  });
  const back = returnToStart && stops.length > 0 ? haversineKm(prev, start) : 0;
  return { legs, distanceKm: legs.reduce((a, b) => a + b, 0) + back };
}

/**
 * Re-optimises a run: the stops already logged or skipped (visited, or given
 * up) stay first, in their order; the stops still to visit are put in the
 * planner's shortest order from the last settled stop (or the start when
 * none is settled). Answers the drop points in the new visiting order.
 */
export function reoptimisedOrder(
  start: LatLng,
  stops: readonly (PlacedStop & { status: StopStatus })[],
  returnToStart: boolean,
): string[] {
  const settled = stops.filter((s) => s.status !== "pending");
  const pending = stops.filter((s) => s.status === "pending");
  if (pending.length === 0) return stops.map((s) => s.dropPointId);
  if (settled.length === 0) {
    // Nothing visited yet: the planner's own answer for the whole run (exact up to EXACT_STOP_LIMIT stops).
    return planRoute({ start, stops: pending.map((s) => ({ id: s.dropPointId, lat: s.lat, lng: s.lng })), returnToStart }).order;
  }
  const from = settled.length ? settled[settled.length - 1]! : start;
  const plan = planRoute({ start: from, stops: pending.map((s) => ({ id: s.dropPointId, lat: s.lat, lng: s.lng })), returnToStart: false });
  // After settled stops a closed run ends back at its start, not at `from`: plan the open path, then keep it
  // or its reverse, whichever makes the shorter whole run (a heuristic, not proven shortest, for that case).
  if (returnToStart) {
    const forward = [...settled.map((s) => s.dropPointId), ...plan.order];
    const reversed = [...settled.map((s) => s.dropPointId), ...[...plan.order].reverse()];
    const byId = new Map(stops.map((s) => [s.dropPointId, s]));
    const km = (order: string[]) => legsInOrder(start, order.map((id) => byId.get(id)!), true).distanceKm;
    return km(reversed) < km(forward) ? reversed : forward;
  }
  return [...settled.map((s) => s.dropPointId), ...plan.order];
}
