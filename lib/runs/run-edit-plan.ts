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
  const from = settled.length ? settled[settled.length - 1]! : start;
  const plan = planRoute({ start: from, stops: pending.map((s) => ({ id: s.dropPointId, lat: s.lat, lng: s.lng })), returnToStart: false });
  // A closed tour's way back is from the last stop to the run's start, not to `from`: plan the open path, then
  // compare it with its reverse when the run returns, keeping the shorter whole run.
  if (returnToStart) {
    const forward = [...settled.map((s) => s.dropPointId), ...plan.order];
    const reversed = [...settled.map((s) => s.dropPointId), ...[...plan.order].reverse()];
    const byId = new Map(stops.map((s) => [s.dropPointId, s]));
    const km = (order: string[]) => legsInOrder(start, order.map((id) => byId.get(id)!), true).distanceKm;
    return km(reversed) < km(forward) ? reversed : forward;
  }
  return [...settled.map((s) => s.dropPointId), ...plan.order];
}
