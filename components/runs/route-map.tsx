"use client";

import dynamic from "next/dynamic";
import { Skeleton } from "@/components/ui/card";

export interface RouteMapProps {
  start: { lat: number; lng: number };
  /** In visiting order; the marker shows the position. */
  stops: { id: string; name: string; lat: number; lng: number; status?: "pending" | "logged" | "skipped" }[];
  returnToStart?: boolean;
  tileUrl: string;
  attribution: string;
  className?: string;
}

// Leaflet touches `window` on import, so the map only ever renders in the browser.
const Inner = dynamic(() => import("./route-map-inner"), {
  ssr: false,
  loading: () => <Skeleton className="h-72 w-full sm:h-96" />,
});

export function RouteMap(props: RouteMapProps) {
  return <Inner {...props} />;
}
