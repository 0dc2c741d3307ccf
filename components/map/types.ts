import type { ReactNode } from "react";
import type { FillShape } from "@/lib/drives/fill";

export interface MapPoint {
  id: string;
  name: string;
  lat: number;
  lng: number;
  tone?: "active" | "paused" | "draft" | "you";
  label?: string;
  /** The bin's fill, drawn as a shape on the pin (public map). */
  fill?: FillShape;
  draggable?: boolean;
  popup?: ReactNode;
}

export interface MapProps {
  points: MapPoint[];
  center: { lat: number; lng: number };
  zoom?: number;
  tileUrl: string;
  attribution: string;
  onMapClick?: (lat: number, lng: number) => void;
  onMarkerDragEnd?: (id: string, lat: number, lng: number) => void;
  onMarkerSelect?: (id: string) => void;
  className?: string;
  label?: string;
}
