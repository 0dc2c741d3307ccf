"use client";

import { useQuery } from "@tanstack/react-query";
import { runQueries } from "@/hooks/queries/runs";
import type { SuggestionRow } from "@/lib/runs/types";
import { RouteMap } from "./route-map";
import { ROUTE_MAP_BOX } from "./route-map-box";
import { useFormat } from "@/hooks/use-look";

const bar = "inline-block h-4 animate-pulse rounded bg-paper-deep align-middle";

/** The route's lines while it is worked out: the same rows and map box, so nothing below moves when it arrives. */
function RouteSkeleton({ stops, returnToStart }: { stops: number; returnToStart: boolean }) {
  return (
    <div className="flex flex-col gap-3" aria-busy="true" aria-hidden="true">
      <p className="text-lg">
        <span className={`${bar} w-48`} />
      </p>
      <div className={`animate-pulse bg-paper-deep ${ROUTE_MAP_BOX}`} />
      <ol className="flex flex-col gap-1">
        {Array.from({ length: stops + 1 + (returnToStart ? 1 : 0) }, (_, i) => (
          <li key={i}>
            <span className={`${bar} w-2/3`} />
          </li>
        ))}
      </ol>
    </div>
  );
}

export function RoutePreview({
  start,
  stops,
  returnToStart,
  tileUrl,
  attribution,
}: {
  start: { lat: number; lng: number } | null;
  stops: SuggestionRow[];
  returnToStart: boolean;
  tileUrl: string;
  attribution: string;
}) {
  const ready = start !== null && stops.length > 0;
  const input = {
    start: start ?? { lat: 0, lng: 0 },
    stops: stops.map((s) => ({ id: s.id, lat: s.lat, lng: s.lng })),
    returnToStart,
  };
  const route = useQuery({ ...runQueries.route(input), enabled: ready });
  const f = useFormat();
  if (!ready) {
    return <p className="text-ink-soft">Choose a start point and at least one drop point to see the route.</p>;
  }
  if (route.isPending) return <RouteSkeleton stops={stops.length} returnToStart={returnToStart} />;
  if (route.isError) return <p role="alert" className="font-semibold text-alarm">{route.error.message}</p>;
  const byId = new Map(stops.map((s) => [s.id, s]));
  const ordered = route.data.order.map((id) => byId.get(id)!).filter(Boolean);
  return (
    <div className="flex flex-col gap-3">
      <p className="text-lg">
        Route length <strong data-testid="route-length">{f.distance(route.data.distanceKm)}</strong>{" "}
        <span className="text-sm text-ink-faint">(straight lines between stops; roads are longer)</span>
      </p>
      <RouteMap start={start} stops={ordered} returnToStart={returnToStart} tileUrl={tileUrl} attribution={attribution} />
      <ol className="flex flex-col gap-1" aria-label="Stops in order">
        <li className="text-ink-soft">Start</li>
        {ordered.map((s, i) => (
          <li key={s.id} className="flex justify-between gap-2">
            <span>
              <span className="mr-2 inline-flex h-6 w-6 items-center justify-center rounded-full bg-ember text-sm font-bold text-white">{i + 1}</span>
              {s.name}
            </span>
            <span className="text-ink-faint">+{f.distance(route.data.legs[i]!.distanceKm)}</span>
          </li>
        ))}
        {returnToStart ? <li className="text-ink-soft">Back to the start (+{f.distance(route.data.legs.at(-1)!.distanceKm)})</li> : null}
      </ol>
    </div>
  );
}
