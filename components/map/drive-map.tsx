"use client";

import dynamic from "next/dynamic";
import { Skeleton } from "@/components/ui/card";
import type { MapProps } from "./types";

// Leaflet touches `window` on import, so the map only ever loads in the browser.
const LeafletMap = dynamic(() => import("./leaflet-map"), {
  ssr: false,
  loading: () => <Skeleton className="h-80 w-full" />,
});

export function DriveMap(props: MapProps) {
  return <LeafletMap {...props} />;
}
