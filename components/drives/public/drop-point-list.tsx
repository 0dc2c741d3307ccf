"use client";

import { useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { FILL_SHAPE_LABEL, fillShape, LEVEL_LABEL } from "@/lib/drives/fill";
import type { PublicDropPointView } from "@/lib/drives/types";
import { haversineKm } from "@/lib/runs/great-circle";
import { formatMoment } from "@/lib/format/clock";
import { DEFAULT_LOOK } from "@/lib/format/default-look";
import { countOf } from "@/lib/plural";

import { FillReportForm } from "./fill-report-form";

type Located = PublicDropPointView & { number: number; km?: number };

export function sortByDistance(points: Located[], from: { lat: number; lng: number } | null): Located[] {
  if (!from) return points;
  return points.map((p) => ({ ...p, km: haversineKm(from, p) })).sort((a, b) => (a.km ?? 0) - (b.km ?? 0));
}

export function DropPointList({
  slug,
  points,
  selected,
  links,
  asOf,
}: {
  slug: string;
  points: PublicDropPointView[];
  selected: string | null;
  links: Record<string, ReactNode>;
  asOf: ReactNode;
}) {
  const [here, setHere] = useState<{ lat: number; lng: number } | null>(null);
  const [locating, setLocating] = useState(false);
  const [locError, setLocError] = useState<string | null>(null);
  const numbered = sortByDistance(points.map((p, i) => ({ ...p, number: i + 1 })), here);

  function locate() {
    if (!("geolocation" in navigator)) {
      setLocError("This browser cannot share a location. The list stays in name order.");
      return;
    }
    setLocating(true);
    setLocError(null);
    navigator.geolocation.getCurrentPosition(
      (pos) => {
        setLocating(false);
        setHere({ lat: pos.coords.latitude, lng: pos.coords.longitude });
      },
      () => {
        setLocating(false);
        setLocError("We could not get your location (permission denied or no signal). The list stays in name order.");
      },
      { timeout: 10_000, maximumAge: 60_000 },
    );
  }

  return (
    <section aria-labelledby="list-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="list-heading" className="text-xl">
          Drop points {here ? "nearest first" : "by name"}
        </h2>
        <Button variant="secondary" onClick={locate} disabled={locating}>
          {locating ? "Finding you…" : here ? "Update my location" : "Sort by distance from me"}
        </Button>
      </div>
      {asOf}
      {locError ? <p role="status" className="text-sun">{locError}</p> : null}
      {numbered.length === 0 ? <p>No drop points are open right now. Check back soon.</p> : null}
      <ol className="flex flex-col gap-3">
        {numbered.map((p) => (
          <li
            key={p.id}
            id={`point-${p.id}`}
            data-testid="drop-point"
            className={`rounded-card border bg-white/70 p-4 ${selected === p.id ? "border-ember ring-2 ring-ember" : "border-paper-edge"}`}
          >
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h3 className="text-lg">
                <span className="mr-2 inline-flex h-7 w-7 items-center justify-center rounded-full bg-ember text-sm text-white" aria-hidden="true">
                  {p.number}
                </span>
                <span className="[overflow-wrap:anywhere]">{p.name}</span>
              </h3>
              {p.km !== undefined ? <span className="font-semibold">{p.km < 1 ? `${Math.round(p.km * 1000)}\u00a0m` : `${p.km.toFixed(1)}\u00a0km`} away</span> : null}
            </div>
            {p.address ? <p className="[overflow-wrap:anywhere]">{p.address}</p> : null}
            <p>
              <span className="font-semibold">Open:</span> {p.hours || "Ask the organisers"}
            </p>
            <p className="text-sm text-ink-soft" data-testid="tallies">
              {countOf(p.tallies.hauls, "haul")} · {countOf(p.tallies.bags, "bag")} collected · {countOf(p.tallies.goodCans, "good can")} · {p.tallies.rejectedCans} set aside
            </p>
            <p className={`text-sm font-semibold ${fillShape(p.fill?.level) === "full" ? "text-alarm" : "text-ink-soft"}`} data-testid="fill" data-fill={fillShape(p.fill?.level)}>
              Bin: {FILL_SHAPE_LABEL[fillShape(p.fill?.level)]}
              {p.fill ? ` — ${LEVEL_LABEL[p.fill.level] ?? `${p.fill.level}\u00a0%`} (${formatMoment(p.fill.reportedAt, DEFAULT_LOOK)})` : " since the last pickup"}
            </p>
            {p.photos.length ? (
              <div className="relative mt-2 flex gap-2 overflow-x-auto">
                {p.photos.map((url) => (
                  // eslint-disable-next-line @next/next/no-img-element -- photos come from the upload host at their own size; next/image would proxy them through the app
                  <img key={url} src={url} alt={`Photo of the bin at ${p.name}`} className="h-28 w-auto rounded-lg border border-paper-edge" />
                ))}
              </div>
            ) : null}
            {links[p.id]}
            <BinReport slug={slug} point={p} />
          </li>
        ))}
      </ol>
    </section>
  );
}

// "Is this bin full?" (FillReportForm); "Close" after a report brings a fresh, closed one.
function BinReport({ slug, point }: { slug: string; point: { id: string; name: string } }) {
  const [round, setRound] = useState(0);
  return <FillReportForm key={round} slug={slug} pointId={point.id} pointName={point.name} onDone={() => setRound((n) => n + 1)} />;
}
