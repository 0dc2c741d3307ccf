"use client";

import "leaflet/dist/leaflet.css";
import L from "leaflet";
import { useEffect, useRef, useState } from "react";
import { createPortal } from "react-dom";
import { DEMO_TILE_BBOX, MAX_ZOOM, MIN_ZOOM } from "@/lib/map/tiles";
import type { MapPoint, MapProps } from "./types";

// Leaflet driven directly from effects (no react-leaflet): the public drive
// page ships this map, and the wrapper library's layer machinery weighed ~2 kB
// compressed there. The map is made once, like react-leaflet's MapContainer
// (later centre/zoom props are ignored); markers follow the points.

// Pins are drawn with CSS, so no marker image has to be found by the bundler.
function pinIcon(tone: MapPoint["tone"], label?: string) {
  const colour = tone === "draft" ? "#8a5a00" : tone === "paused" ? "#6b6156" : tone === "you" ? "#204a33" : "#a8431a";
  return L.divIcon({
    className: "cantrove-pin",
    html: `<span style="display:flex;align-items:center;justify-content:center;width:30px;height:30px;border-radius:50% 50% 50% 0;transform:rotate(-45deg);background:${colour};border:2px solid #fff;box-shadow:0 1px 4px rgba(0,0,0,.4)"><span style="transform:rotate(45deg);color:#fff;font-weight:700;font-size:13px">${label ?? ""}</span></span>`,
    iconSize: [30, 30],
    iconAnchor: [15, 30],
    popupAnchor: [0, -28],
  });
}

const round6 = (n: number) => Number(n.toFixed(6));

export default function LeafletMap({ points, center, zoom = 14, tileUrl, attribution, onMapClick, onMarkerDragEnd, onMarkerSelect, className = "h-80", label }: MapProps) {
  const box = useRef<HTMLDivElement>(null);
  const [map, setMap] = useState<L.Map | null>(null);
  // The latest callbacks, read by Leaflet's listeners when they fire.
  const on = useRef({ onMapClick, onMarkerDragEnd, onMarkerSelect });
  on.current = { onMapClick, onMarkerDragEnd, onMarkerSelect };
  const markers = useRef(new Map<string, { marker: L.Marker; look: string }>());
  // One element per popup; React renders the popup's content into it.
  const hosts = useRef(new Map<string, HTMLDivElement>());
  const host = (id: string) => {
    let el = hosts.current.get(id);
    if (!el) hosts.current.set(id, (el = document.createElement("div")));
    return el;
  };

  useEffect(() => {
    const local = tileUrl.startsWith("/tiles/");
    const made = L.map(box.current!, {
      center: [center.lat, center.lng],
      zoom,
      minZoom: local ? MIN_ZOOM : 2,
      maxZoom: local ? MAX_ZOOM : 19,
      fadeAnimation: false,
    });
    L.tileLayer(tileUrl, {
      attribution,
      minZoom: local ? MIN_ZOOM : 0,
      maxZoom: local ? MAX_ZOOM : 19,
      bounds: local ? L.latLngBounds([DEMO_TILE_BBOX.south, DEMO_TILE_BBOX.west], [DEMO_TILE_BBOX.north, DEMO_TILE_BBOX.east]) : undefined,
      errorTileUrl: local ? "/tiles/sea.png" : undefined,
    }).addTo(made);
    made.on("click", (e: L.LeafletMouseEvent) => on.current.onMapClick?.(round6(e.latlng.lat), round6(e.latlng.lng)));
    const placed = markers.current;
    setMap(made);
    return () => {
      made.remove();
      placed.clear();
    };
    // Made once per mount, as the map's own state (pan, zoom) belongs to the visitor.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);

  useEffect(() => {
    if (!map) return;
    const placed = markers.current;
    const seen = new Set<string>();
    for (const p of points) {
      seen.add(p.id);
      const look = `${p.tone ?? ""}|${p.label ?? ""}`;
      let entry = placed.get(p.id);
      if (!entry) {
        const marker = L.marker([p.lat, p.lng], { icon: pinIcon(p.tone, p.label), title: p.name, alt: p.name, keyboard: true, draggable: Boolean(p.draggable) });
        const id = p.id;
        marker.on("dragend", () => {
          const ll = marker.getLatLng();
          on.current.onMarkerDragEnd?.(id, round6(ll.lat), round6(ll.lng));
        });
        marker.on("click", () => on.current.onMarkerSelect?.(id));
        // Enter on a focused pin opens its popup (Leaflet) and selects it, as a tap does.
        marker.on("keypress", (e) => (e as L.LeafletKeyboardEvent).originalEvent.key === "Enter" && on.current.onMarkerSelect?.(id));
        marker.addTo(map);
        placed.set(id, (entry = { marker, look }));
      } else {
        entry.marker.setLatLng([p.lat, p.lng]);
        if (entry.look !== look) entry.marker.setIcon(pinIcon(p.tone, p.label));
        entry.look = look;
        if (p.draggable) entry.marker.dragging?.enable();
        else entry.marker.dragging?.disable();
      }
      if (p.popup && !entry.marker.getPopup()) entry.marker.bindPopup(host(p.id));
      if (!p.popup && entry.marker.getPopup()) entry.marker.unbindPopup();
    }
    for (const [id, entry] of placed) {
      if (!seen.has(id)) {
        entry.marker.remove();
        placed.delete(id);
        hosts.current.delete(id);
      }
    }
  }, [map, points]);

  // Fit the real (non-draft) points when the set of points changes, not on every refetch.
  const key = points.map((p) => p.id).join(",");
  useEffect(() => {
    if (!map) return;
    const real = points.filter((p) => p.tone !== "draft");
    if (real.length >= 2) map.fitBounds(L.latLngBounds(real.map((p) => [p.lat, p.lng] as [number, number])), { padding: [40, 40], maxZoom: 16 });
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key, map]);

  return (
    <div role="region" aria-label={label ?? "Map"} className={`overflow-hidden rounded-card border border-paper-edge ${className}`}>
      <div ref={box} className="h-full w-full" style={{ background: "#a9cbd6" }} />
      {map ? points.map((p) => (p.popup ? createPortal(p.popup, host(p.id), p.id) : null)) : null}
    </div>
  );
}
