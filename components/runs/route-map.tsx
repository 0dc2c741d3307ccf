"use client";

import { lazy, Suspense } from "react";
import { useNearViewport } from "@/hooks/use-near-viewport";
import { ROUTE_MAP_BOX } from "./route-map-box";

export interface RouteMapProps {
  start: { lat: number; lng: number };
  /** In visiting order; the marker shows the position. */
  stops: { id: string; name: string; lat: number; lng: number; status?: "pending" | "logged" | "skipped" | "released" }[];
  returnToStart?: boolean;
  tileUrl: string;
  attribution: string;
  className?: string;
}

// Leaflet touches `window` on import, so the map only ever renders in the
// browser, and its code (Leaflet is the largest part of these pages) loads once
// the map is near the screen. The placeholder has the map's own box, so
// nothing moves when the map arrives.
const Inner = lazy(() => import("./route-map-inner"));

export function RouteMap(props: RouteMapProps) {
  const [ref, near] = useNearViewport<HTMLDivElement>();
  const box = props.className ?? ROUTE_MAP_BOX;
  const placeholder = <div ref={ref} aria-hidden="true" className={`animate-pulse bg-paper-deep ${box}`} />;
  if (!near) return placeholder;
  return (
    <Suspense fallback={placeholder}>
      <Inner {...props} />
    </Suspense>
  );
}
