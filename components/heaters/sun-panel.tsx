"use client";

import { useState } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { formatNumber } from "@/lib/heaters/format";
import { CLEAR_DAY_ASSUMPTIONS, clearDayEnergy } from "@/lib/heaters/sun";

const FACINGS: Array<[string, number]> = [
  ["North", 0], ["North-east", 45], ["East", 90], ["South-east", 135], ["South", 180], ["South-west", 225], ["West", 270], ["North-west", 315],
];

function check(value: number, min: number, max: number, label: string): string | undefined {
  if (!Number.isFinite(value)) return `${label} must be a number`;
  if (value < min || value > max) return `${label} must be between ${min} and ${max}`;
  return undefined;
}

/** Clear-day sunlight on the wall the heater hangs on, and what the heater might make of it. */
export function SunPanel({ apertureAreaM2, efficiency, latitude, today }: { apertureAreaM2: number; efficiency: number | null; latitude: number; today: string }) {
  const [lat, setLat] = useState(String(latitude));
  const [bearing, setBearing] = useState(latitude >= 0 ? "180" : "0");
  const [date, setDate] = useState(today);
  const errors = {
    lat: check(Number(lat), -66, 66, "Latitude"),
    bearing: check(Number(bearing), 0, 360, "Wall facing"),
    date: /^\d{4}-\d{2}-\d{2}$/.test(date) && !Number.isNaN(Date.parse(date)) ? undefined : "Pick a date",
  };
  const ok = !errors.lat && !errors.bearing && !errors.date;
  const day = ok ? clearDayEnergy({ latitude: Number(lat), date: new Date(date), facingBearing: Number(bearing) }) : null;
  const heatKWh = day && efficiency !== null ? day.kWhPerM2 * apertureAreaM2 * efficiency : null;

  return (
    <section aria-labelledby="sun-heading" className="flex flex-col gap-3 border-t border-paper-edge pt-4">
      <h3 id="sun-heading" className="text-base">A clear day on your wall</h3>
      <div className="grid gap-x-4 sm:grid-cols-3">
        <Field id="sun-lat" label="Latitude (°, south negative)" inputMode="decimal" value={lat} error={errors.lat} onChange={(e) => setLat(e.target.value)} />
        <SelectField id="sun-bearing" label="Wall faces" value={bearing} onChange={(e) => setBearing(e.target.value)} options={FACINGS.map(([name, deg]) => ({ value: String(deg), label: `${name} (${deg}°)` }))} />
        <Field id="sun-date" type="date" label="Day" value={date} error={errors.date} onChange={(e) => setDate(e.target.value)} />
      </div>
      {day ? (
        <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4" aria-live="polite">
          <Figure id="day-energy" label="Sunlight on the wall" value={`${formatNumber(day.kWhPerM2, 2)} kWh/m² a day`} />
          <Figure id="day-peak" label="Peak" value={`${formatNumber(day.peakWm2)} W/m²`} />
          <Figure id="day-hours" label="Sun on the wall" value={`${formatNumber(day.sunlitHours, 1)} h`} />
          <Figure id="day-heat" label="Heat for the room (estimate)" value={heatKWh === null ? "—" : `${formatNumber(heatKWh, 2)} kWh`} />
        </dl>
      ) : null}
      <details className="text-sm text-ink-soft">
        <summary className="min-h-11 cursor-pointer py-2.5 font-semibold text-ink">What the clear-day figure assumes</summary>
        <ul className="mt-2 list-disc pl-5">
          {CLEAR_DAY_ASSUMPTIONS.map((a) => (
            <li key={a}>{a}</li>
          ))}
          <li>Heat for the room = sunlight on the wall × aperture × the efficiency above, held all day: a rough upper figure.</li>
        </ul>
      </details>
    </section>
  );
}

function Figure({ id, label, value }: { id: string; label: string; value: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm text-ink-faint">{label}</dt>
      <dd className="text-lg font-bold" data-figure={id}>{value}</dd>
    </div>
  );
}
