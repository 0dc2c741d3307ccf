"use client";

import "leaflet/dist/leaflet.css";
import L from "leaflet";
import { useCallback, useEffect, useRef, useState } from "react";
import { createPortal } from "react-dom";
import { DEMO_TILE_BBOX, MAX_ZOOM, MIN_ZOOM } from "@/lib/map/tiles";
import type { MapPoint, MapProps } from "./types";
import { fillGlyphSvg } from "./fill-glyph";

// Plain Leaflet under React (no react-leaflet: its wrappers cost the public
// drive page about 5 kB of compressed JavaScript): the map is made once, each
// pin is a component owning its marker, and a pin's popup content is rendered
// by React into the popup's element through a portal.
// Pins are drawn with CSS (.cantrove-pin in app/globals.css, so the shape's
// styles are not part of this page's JavaScript), and no marker image has to be
// found by the bundler. The 30 px pin sits in a 44 × 44 px box, the target a
// finger gets (WCAG 2.5.5); the anchor stays on the pin's tip.
function pinIcon(tone: MapPoint["tone"], label?: string, fill?: MapPoint["fill"]) {
  const colour = tone === "draft" ? "#8a5a00" : tone === "paused" ? "#6b6156" : tone === "you" ? "#204a33" : "#a8431a";
  return L.divIcon({
    className: "cantrove-pin",
    html: `<span data-fill="${fill ?? "none"}"><span style="background:${colour}"><span>${label ?? ""}</span></span>${fillGlyphSvg(fill)}</span>`,
    iconSize: [44, 44],
    iconAnchor: [22, 30],
    popupAnchor: [0, -28],
  });
}

/** The latest value, for event handlers bound once. */
function useLatest<T>(value: T) {
  const ref = useRef(value);
  useEffect(() => {
    ref.current = value;
  });
  return ref;
}

function Pin({ map, point, onDragEnd, onSelect }: { map: L.Map; point: MapPoint; onDragEnd?: MapProps["onMarkerDragEnd"]; onSelect?: MapProps["onMarkerSelect"] }) {
  const { id, name, lat, lng, tone, label, fill, draggable } = point;
  // The marker object is made once per pin (Pin is keyed by the point's id); it joins the map in an effect.
  const [marker] = useState(() => L.marker([lat, lng], { icon: pinIcon(tone, label, fill), title: name, alt: name, keyboard: true, draggable: Boolean(draggable) }));
  const [popupBox] = useState(() => document.createElement("div"));
  const dragEnd = useLatest(onDragEnd);
  const select = useLatest(onSelect);
  const hasPopup = Boolean(point.popup);

  useEffect(() => {
    marker.addTo(map);
    const onDrag = () => {
      const ll = marker.getLatLng();
      dragEnd.current?.(id, Number(ll.lat.toFixed(6)), Number(ll.lng.toFixed(6)));
    };
    const onClick = () => select.current?.(id);
    marker.on("dragend", onDrag);
    marker.on("click", onClick);
    return () => {
      marker.off("dragend", onDrag);
      marker.off("click", onClick);
      marker.remove();
    };
  }, [map, marker, id, dragEnd, select]);
  useEffect(() => {
    marker.setLatLng([lat, lng]);
  }, [marker, lat, lng]);
  useEffect(() => {
    marker.setIcon(pinIcon(tone, label, fill));
  }, [marker, tone, label, fill]);
  useEffect(() => {
    if (draggable) marker.dragging?.enable();
    else marker.dragging?.disable();
  }, [marker, draggable]);
  useEffect(() => {
    if (!hasPopup) return;
    marker.bindPopup(popupBox);
    return () => {
      marker.unbindPopup();
    };
  }, [marker, hasPopup, popupBox]);
  return hasPopup ? createPortal(point.popup, popupBox) : null;
}

export default function LeafletMap({ points, center, zoom = 14, tileUrl, attribution, onMapClick, onMarkerDragEnd, onMarkerSelect, className = "h-80", label }: MapProps) {
  const [map, setMap] = useState<L.Map | null>(null);
  const mapClick = useLatest(onMapClick);

  // Made once, when its box is attached, like react-leaflet's MapContainer: later centre, zoom and tile props do not move it.
  const attach = useCallback((box: HTMLDivElement | null) => {
    if (!box) return;
    const local = tileUrl.startsWith("/tiles/");
    const m = L.map(box, { center: [center.lat, center.lng], zoom, minZoom: local ? MIN_ZOOM : 2, maxZoom: local ? MAX_ZOOM : 19, fadeAnimation: false });
    L.tileLayer(tileUrl, {
      attribution,
      minZoom: local ? MIN_ZOOM : 0,
      maxZoom: local ? MAX_ZOOM : 19,
      ...(local
        ? { bounds: L.latLngBounds([DEMO_TILE_BBOX.south, DEMO_TILE_BBOX.west], [DEMO_TILE_BBOX.north, DEMO_TILE_BBOX.east]), errorTileUrl: "/tiles/sea.png" }
        : {}),
    }).addTo(m);
    m.on("click", (e: L.LeafletMouseEvent) => mapClick.current?.(Number(e.latlng.lat.toFixed(6)), Number(e.latlng.lng.toFixed(6))));
    setMap(m);
    return () => {
      m.remove();
      setMap(null);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- made once (see above)
  }, []);

  // Refit only when the set of points changes, not on every refetch.
  const key = points.map((p) => p.id).join(",");
  useEffect(() => {
    if (!map) return;
    const real = points.filter((p) => p.tone !== "draft");
    if (real.length >= 2) map.fitBounds(L.latLngBounds(real.map((p) => [p.lat, p.lng] as [number, number])), { padding: [40, 40], maxZoom: 16 });
    // eslint-disable-next-line react-hooks/exhaustive-deps -- see above
  }, [key, map]);

  return (
    <div role="region" aria-label={label ?? "Map"} className={`overflow-hidden rounded-card border border-paper-edge ${className}`}>
      <div ref={attach} className="h-full w-full" style={{ background: "#a9cbd6" }} />
      {map ? points.map((p) => <Pin key={p.id} map={map} point={p} onDragEnd={onMarkerDragEnd} onSelect={onMarkerSelect} />) : null}
    </div>
  );
}
