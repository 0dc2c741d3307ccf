"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { DriveMap } from "@/components/map/drive-map";
import type { DropPointRecord } from "@/lib/drives/types";
import { DropPointForm, type DropPointValues } from "./drop-point-form";

export function DropPointEdit({ point, tileUrl, attribution }: { point: DropPointRecord; tileUrl: string; attribution: string }) {
  const router = useRouter();
  const [values, setValues] = useState<DropPointValues>({
    ...point,
    lat: String(point.lat),
    lng: String(point.lng),
    capacityBags: String(point.capacityBags),
  });
  const [saved, setSaved] = useState(false);
  const lat = Number(values.lat);
  const lng = Number(values.lng);
  const placeable = Number.isFinite(lat) && Number.isFinite(lng) && Math.abs(lat) <= 90 && Math.abs(lng) <= 180;
  const update = (v: DropPointValues) => {
    setSaved(false);
    setValues(v);
  };
  return (
    <div className="flex flex-col gap-4">
      <DriveMap
        points={placeable ? [{ id: point.id, name: values.name || point.name, lat, lng, draggable: true }] : []}
        center={{ lat: point.lat, lng: point.lng }}
        zoom={16}
        tileUrl={tileUrl}
        attribution={attribution}
        className="h-64"
        label="Drag the pin or click the map to move this drop point"
        onMapClick={(la, ln) => update({ ...values, lat: String(la), lng: String(ln) })}
        onMarkerDragEnd={(_id, la, ln) => update({ ...values, lat: String(la), lng: String(ln) })}
      />
      <DropPointForm
        target={{ id: point.id }}
        values={values}
        onChange={update}
        submitLabel="Save drop point"
        onSaved={() => {
          setSaved(true);
          router.refresh();
        }}
        onRefused={() => setSaved(false)}
      />
      {saved ? <p role="status" className="font-semibold text-moss-deep">Saved.</p> : null}
    </div>
  );
}
