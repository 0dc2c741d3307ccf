"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { DriveMap } from "@/components/map/drive-map";
import type { MapPoint } from "@/components/map/types";
import { FormError } from "@/components/ui/field";
import { useMoveDropPoint } from "@/hooks/queries/drive-writes";
import type { DropPointRecord } from "@/lib/drives/types";
import { DropPointForm, emptyDropPoint, type DropPointValues } from "./drop-point-form";
import { countOf } from "@/lib/plural";

export function DropPointsEditor({
  driveId,
  points,
  tileUrl,
  attribution,
  centre,
}: {
  driveId: string;
  points: DropPointRecord[];
  tileUrl: string;
  attribution: string;
  centre: { lat: number; lng: number };
}) {
  const router = useRouter();
  const [draft, setDraft] = useState<DropPointValues | null>(null);
  const move = useMoveDropPoint({ onSuccess: () => router.refresh() });
  const mapPoints: MapPoint[] = points.map((p) => ({
    id: p.id,
    name: p.name,
    lat: p.lat,
    lng: p.lng,
    draggable: true,
    tone: p.active ? "active" : "paused",
  }));
  const draftLat = Number(draft?.lat);
  const draftLng = Number(draft?.lng);
  if (draft && draft.lat !== "" && draft.lng !== "" && Number.isFinite(draftLat) && Number.isFinite(draftLng) && Math.abs(draftLat) <= 90 && Math.abs(draftLng) <= 180) {
    mapPoints.push({ id: "draft", name: "New drop point", lat: draftLat, lng: draftLng, tone: "draft", draggable: true, label: "+" });
  }

  return (
    <div className="flex flex-col gap-4">
      <p>Click the map where a new drop point should go, or drag a pin to move it. Keyboard users can type the coordinates instead.</p>
      <DriveMap
        points={mapPoints}
        center={centre}
        zoom={14}
        tileUrl={tileUrl}
        attribution={attribution}
        className="h-80 sm:h-96"
        label="Map for placing drop points"
        onMapClick={(lat, lng) => setDraft((d) => ({ ...(d ?? emptyDropPoint()), lat: String(lat), lng: String(lng) }))}
        onMarkerDragEnd={(id, lat, lng) => {
          if (id === "draft") setDraft((d) => (d ? { ...d, lat: String(lat), lng: String(lng) } : d));
          else move.mutate({ id, lat, lng });
        }}
      />
      <FormError message={move.error?.message} />
      {move.isSuccess ? <p role="status" className="text-moss-deep">Pin moved and saved.</p> : null}
      {draft ? (
        <section aria-labelledby="new-point-heading" className="rounded-card border-2 border-sun bg-sun-soft/40 p-4">
          <h3 id="new-point-heading" className="mb-2 text-lg">New drop point</h3>
          <DropPointForm
            target={{ driveId }}
            values={draft}
            onChange={setDraft}
            submitLabel="Add drop point"
            onSaved={() => {
              setDraft(null);
              router.refresh();
            }}
          />
        </section>
      ) : (
        <button type="button" className="tap self-start underline" onClick={() => setDraft(emptyDropPoint(String(centre.lat), String(centre.lng)))}>
          Add a drop point by typing its details
        </button>
      )}
      <ul className="divide-y divide-paper-edge" aria-label="Drop points of this drive">
        {points.map((p) => (
          <li key={p.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
            <span>
              <Link href={`/organise/drop-points/${p.id}`} className="tap font-semibold">{p.name}</Link>
              {p.active ? "" : <span className="text-ink-faint"> · paused</span>}
              <span className="block text-sm text-ink-soft">{p.address} · {p.hours} · {countOf(p.capacityBags, "bag")}</span>
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
