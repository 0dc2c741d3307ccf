"use client";

import "leaflet/dist/leaflet.css";
import L from "leaflet";
import { useEffect, useMemo } from "react";
import { MapContainer, Marker, Popup, TileLayer, useMap, useMapEvents } from "react-leaflet";
import { DEMO_TILE_BBOX, MAX_ZOOM, MIN_ZOOM } from "@/lib/map/tiles";
import type { MapPoint, MapProps } from "./types";
import { fillGlyphSvg } from "./fill-glyph";

// Pins are drawn with CSS, so no marker image has to be found by the bundler.
function pinIcon(tone: MapPoint["tone"], label?: string, fill?: MapPoint["fill"]) {
  const colour = tone === "draft" ? "#8a5a00" : tone === "paused" ? "#6b6156" : tone === "you" ? "#204a33" : "#a8431a";
  return L.divIcon({
    className: "cantrove-pin",
    html: `<span style="position:relative;display:block;width:30px;height:30px" data-fill="${fill ?? "none"}"><span style="display:flex;align-items:center;justify-content:center;width:30px;height:30px;border-radius:50% 50% 50% 0;transform:rotate(-45deg);background:${colour};border:2px solid #fff;box-shadow:0 1px 4px rgba(0,0,0,.4)"><span style="transform:rotate(45deg);color:#fff;font-weight:700;font-size:13px">${label ?? ""}</span></span>${fillGlyphSvg(fill)}</span>`,
    iconSize: [30, 30],
    iconAnchor: [15, 30],
    popupAnchor: [0, -28],
  });
}

function ClickCatcher({ onClick }: { onClick?: (lat: number, lng: number) => void }) {
  useMapEvents({
    click(e) {
      onClick?.(Number(e.latlng.lat.toFixed(6)), Number(e.latlng.lng.toFixed(6)));
    },
  });
  return null;
}

function FitPoints({ points }: { points: MapPoint[] }) {
  const map = useMap();
  const key = points.map((p) => p.id).join(",");
  useEffect(() => {
    const real = points.filter((p) => p.tone !== "draft");
    if (real.length >= 2) map.fitBounds(L.latLngBounds(real.map((p) => [p.lat, p.lng] as [number, number])), { padding: [40, 40], maxZoom: 16 });
    // eslint-disable-next-line react-hooks/exhaustive-deps -- refit only when the set of points changes (key), not on every refetch
  }, [key, map]);
  return null;
}

export default function LeafletMap({ points, center, zoom = 14, tileUrl, attribution, onMapClick, onMarkerDragEnd, onMarkerSelect, className = "h-80", label }: MapProps) {
  const local = tileUrl.startsWith("/tiles/");
  const bounds = useMemo(
    () => L.latLngBounds([DEMO_TILE_BBOX.south, DEMO_TILE_BBOX.west], [DEMO_TILE_BBOX.north, DEMO_TILE_BBOX.east]),
    [],
  );
  return (
    <div role="region" aria-label={label ?? "Map"} className={`overflow-hidden rounded-card border border-paper-edge ${className}`}>
      <MapContainer
        center={[center.lat, center.lng]}
        zoom={zoom}
        minZoom={local ? MIN_ZOOM : 2}
        maxZoom={local ? MAX_ZOOM : 19}
        fadeAnimation={false}
        className="h-full w-full"
        style={{ background: "#a9cbd6" }}
      >
        <TileLayer
          url={tileUrl}
          attribution={attribution}
          minZoom={local ? MIN_ZOOM : 0}
          maxZoom={local ? MAX_ZOOM : 19}
          bounds={local ? bounds : undefined}
          errorTileUrl={local ? "/tiles/sea.png" : undefined}
        />
        <ClickCatcher onClick={onMapClick} />
        <FitPoints points={points} />
        {points.map((p) => (
          <Marker
            key={p.id}
            position={[p.lat, p.lng]}
            icon={pinIcon(p.tone, p.label, p.fill)}
            title={p.name}
            alt={p.name}
            keyboard
            draggable={Boolean(p.draggable)}
            eventHandlers={{
              dragend(e) {
                const ll = (e.target as L.Marker).getLatLng();
                onMarkerDragEnd?.(p.id, Number(ll.lat.toFixed(6)), Number(ll.lng.toFixed(6)));
              },
              click() {
                onMarkerSelect?.(p.id);
              },
            }}
          >
            {p.popup ? <Popup>{p.popup}</Popup> : null}
          </Marker>
        ))}
      </MapContainer>
    </div>
  );
}
