import { endpoint } from "@/lib/api/endpoint";
import { planRoute } from "@/lib/runs/route-order";
import { routeInputSchema } from "@/lib/runs/route-schemas";

export const dynamic = "force-dynamic";

// Open to anyone: a pure computation over the coordinates sent, no stored data.
// The same body always yields the same order, so a repeated Idempotency-Key
// with the same body gets the same answer without storing anything.
export const POST = endpoint({ who: "anyone", body: routeInputSchema }, async ({ body, raw }) => {
  const sent = JSON.parse(raw) as { stops?: { id?: unknown }[] };
  const plan = planRoute(body);
  // The schema compares ids as text; hand each back exactly as the caller sent it (7 stays a number).
  const original = new Map<string, unknown>(body.stops.map((stop, i) => [stop.id, sent.stops?.[i]?.id ?? stop.id]));
  const back = (id: string | null) => (id === null ? null : original.get(id));
  return {
    order: plan.order.map(back),
    distanceKm: plan.distanceKm,
    legs: plan.legs.map((leg) => ({ from: back(leg.from), to: back(leg.to), distanceKm: leg.km })),
  };
});
