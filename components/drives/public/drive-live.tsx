"use client";

import { useMemo, useState, type ReactNode } from "react";
import { DriveMap } from "@/components/map/drive-map";
import type { MapPoint } from "@/components/map/types";
import { FILL_SHAPE_LABEL, fillShape } from "@/lib/drives/fill";
import { Card } from "@/components/ui/card";
import { driveQueries } from "@/hooks/queries/drives";
import type { PublicDriveView, PublicDropPointView } from "@/lib/drives/types";
import { DropPointList } from "./drop-point-list";
import { PledgeForm } from "./pledge-form";
import { useLiveQuery } from "@/hooks/queries/live-query";
import { DriveProgressBar } from "./progress-bar";
import { countOf } from "@/lib/plural";
// The clock and the default look only, not the lib/format barrel: this page's JavaScript budget is tight.
import { formatMoment } from "@/lib/format/clock";
import { DEFAULT_LOOK } from "@/lib/format/default-look";

export function DriveLive({
  slug,
  initialDrive,
  initialPoints,
  tileUrl,
  attribution,
  pointLinks,
  pledgePoint,
  readAt,
  timeZone,
}: {
  slug: string;
  initialDrive: PublicDriveView;
  initialPoints: PublicDropPointView[];
  tileUrl: string;
  attribution: string;
  /** Server-rendered links per drop point id (no client JavaScript). */
  pointLinks: Record<string, ReactNode>;
  /** The drop point the pledge form opens on (?point=…), when valid. */
  pledgePoint: string;
  /** When the server read the initial figures (ms since 1970). */
  readAt: number;
  timeZone: string;
}) {
  const drive = useLiveQuery(driveQueries.public(slug), initialDrive);
  const points = useLiveQuery(driveQueries.publicDropPoints(slug), initialPoints);
  const [selected, setSelected] = useState<string | null>(null);
  const list = points.data ?? [];
  // The pledge form only needs names; keep the same array until those change.
  const choiceKey = list.map((p) => `${p.id}\t${p.name}`).join("\n");
  // eslint-disable-next-line react-hooks/exhaustive-deps -- choiceKey stands for the names and ids of list
  const choices = useMemo(() => list.map(({ id, name }) => ({ id, name })), [choiceKey]);
  const centre = list.length
    ? { lat: list.reduce((s, p) => s + p.lat, 0) / list.length, lng: list.reduce((s, p) => s + p.lng, 0) / list.length }
    : { lat: 47.2, lng: -8.0 };
  const mapPoints: MapPoint[] = list.map((p, i) => ({
    id: p.id,
    name: p.name,
    lat: p.lat,
    lng: p.lng,
    label: String(i + 1),
    fill: fillShape(p.fill?.level),
    popup: (
      <div>
        <p className="font-bold">{p.name}</p>
        <p data-testid="popup-fill">Bin: {FILL_SHAPE_LABEL[fillShape(p.fill?.level)]}</p>
        <p>{p.hours}</p>
        <p>
          {countOf(p.tallies.bags, "bag")} in · {countOf(p.tallies.goodCans, "good can")}
        </p>
        <a href={`#point-${p.id}`}>Details and “bin is full”</a>
      </div>
    ),
  }));

  return (
    <div className="flex flex-col gap-6">
      <Card title="How far we have come">
        {drive.data ? <DriveProgressBar data={drive.data} /> : null}
        <AsOf at={drive.updatedAt || readAt} timeZone={timeZone} />
        {drive.isError ? <p className="text-alarm">Could not refresh the progress; showing the last figures.</p> : null}
      </Card>
      <section aria-labelledby="map-heading" className="flex flex-col gap-2">
        <h2 id="map-heading" className="text-xl">
          Drop points on the map
        </h2>
        <p className="text-sm text-ink-soft">Numbers match the list below. The badge on a pin shows the bin: an empty ring when reported empty, half filled when part full, a solid disc with a bar when full; no badge when nothing was reported since the last pickup. The list shows the same places, and the same fill in words, for anyone who prefers reading to panning.</p>
        <DriveMap
          points={mapPoints}
          center={centre}
          zoom={14}
          tileUrl={tileUrl}
          attribution={attribution}
          onMarkerSelect={setSelected}
          className="h-80 sm:h-[28rem]"
          label={`Map of the ${initialDrive.drive.name} drop points`}
        />
      </section>
      <DropPointList slug={slug} points={list} selected={selected} links={pointLinks} asOf={<AsOf at={points.updatedAt || readAt} timeZone={timeZone} />} />
      <section id="pledge" aria-labelledby="pledge-heading" className="rounded-card border border-paper-edge bg-white/70 p-4 shadow-sm sm:p-5">
        <h2 id="pledge-heading" className="mb-3 text-lg">Pledge some cans</h2>
        <PledgeForm slug={slug} points={choices} initialPoint={pledgePoint} />
      </section>
    </div>
  );
}

/** When the figures shown were read, in the group's time zone (the same on the server and in the browser). */
function AsOf({ at, timeZone }: { at: number; timeZone: string }) {
  return (
    <p className="mt-1 text-sm text-ink-faint" data-testid="as-of">
      Figures as of {formatMoment(new Date(at), { locale: DEFAULT_LOOK.locale, timeZone })}; they refresh every 30 seconds while this page is open.
    </p>
  );
}
