"use client";

import "leaflet/dist/leaflet.css";
import L from "leaflet";
import { useEffect, useMemo } from "react";
import { CircleMarker, MapContainer, Marker, Polyline, TileLayer, Tooltip, useMap } from "react-leaflet";
import type { RouteMapProps } from "./route-map";
import { ROUTE_MAP_BOX } from "./route-map-box";

const MARKER_COLOUR = { pending: "#a8431a", logged: "#2f6a4a", skipped: "#6b6156", released: "#8a8178" } as const;

function numberIcon(n: number, status: keyof typeof MARKER_COLOUR) {
  return L.divIcon({
    className: "",
    // The 28 px disc centred in a 44 × 44 px transparent target (WCAG 2.5.5).
    html: `<span style="display:flex;align-items:center;justify-content:center;width:44px;height:44px"><span style="display:flex;align-items:center;justify-content:center;width:28px;height:28px;border-radius:999px;border:2px solid #fff;background:${MARKER_COLOUR[status]};color:#fff;font-weight:700;font-size:14px;box-shadow:0 1px 3px rgba(0,0,0,.4)">${n}</span></span>`,
    iconSize: [44, 44],
    iconAnchor: [22, 22],
  });
}

function FitTo({ points }: { points: [number, number][] }) {
  const map = useMap();
  const key = JSON.stringify(points);
  useEffect(() => {
    if (points.length === 0) return;
    if (points.length === 1) map.setView(points[0]!, 15);
    else map.fitBounds(L.latLngBounds(points), { padding: [28, 28] });
    // eslint-disable-next-line react-hooks/exhaustive-deps -- key captures every coordinate; points is a fresh array each render
  }, [map, key]);
  return null;
}

export default function RouteMapInner({ start, stops, returnToStart, tileUrl, attribution, className }: RouteMapProps) {
  const line = useMemo(() => {
    const path: [number, number][] = [[start.lat, start.lng], ...stops.map((s) => [s.lat, s.lng] as [number, number])];
    if (returnToStart && stops.length) path.push([start.lat, start.lng]);
    return path;
  }, [start, stops, returnToStart]);
  return (
    <MapContainer
      center={[start.lat, start.lng]}
      zoom={14}
      fadeAnimation={false}
      scrollWheelZoom={false}
      className={className ?? ROUTE_MAP_BOX}
      aria-label="Map of the route"
    >
      <TileLayer url={tileUrl} attribution={attribution} />
      <FitTo points={line} />
      <Polyline positions={line} pathOptions={{ color: "#7f3011", weight: 4, opacity: 0.8 }} />
      <CircleMarker center={[start.lat, start.lng]} radius={9} pathOptions={{ color: "#1f1b16", fillColor: "#fbf7f0", fillOpacity: 1, weight: 3 }}>
        <Tooltip>Start</Tooltip>
      </CircleMarker>
      {stops.map((s, i) => (
        <Marker key={s.id} position={[s.lat, s.lng]} icon={numberIcon(i + 1, s.status ?? "pending")} title={`${i + 1}. ${s.name}`}>
          <Tooltip>{`${i + 1}. ${s.name}`}</Tooltip>
        </Marker>
      ))}
    </MapContainer>
  );
}
