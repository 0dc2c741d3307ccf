"use client";

import { lazy, Suspense, useSyncExternalStore } from "react";
import { Skeleton } from "@/components/ui/card";
import { LoadBoundary } from "@/components/ui/load-boundary";
import { useNearViewport } from "@/hooks/use-near-viewport";
import type { MapProps } from "./types";

// Leaflet touches `window` on import, so the map only ever loads in the
// browser: the server and the hydrating client render the skeleton, then the
// browser swaps in the lazily loaded map. (React.lazy rather than next/dynamic:
// next/dynamic's client helpers cost the public drive page ~2 kB compressed.)
const LeafletMap = lazy(() => import("./leaflet-map"));

const noSubscription = () => () => undefined;

/** False on the server and during hydration, true once running in the browser. */
export function useInBrowser(): boolean {
  return useSyncExternalStore(noSubscription, () => true, () => false);
}

export function DriveMap(props: MapProps) {
  const inBrowser = useInBrowser();
  // Leaflet and its markers cost a phone a long task (≈130 ms at a 4× slower CPU): the map
  // loads when a person scrolls near it, not while the first screen is still settling.
  const [ref, near] = useNearViewport<HTMLDivElement>("100px");
  // The map's own box (className, h-80 by default), so nothing moves when it arrives.
  const placeholder = <Skeleton className={`w-full ${props.className ?? "h-80"}`} />;
  if (!inBrowser || !near) return <div ref={ref} data-map-slot="">{placeholder}</div>;
  return (
    <LoadBoundary what="map">
      <Suspense fallback={placeholder}>
        <LeafletMap {...props} />
      </Suspense>
    </LoadBoundary>
  );
}
