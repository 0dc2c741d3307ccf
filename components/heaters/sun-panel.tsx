"use client";

import { Field, SelectField } from "@/components/ui/field";
import { formatNumber } from "@/lib/heaters/format";
import { CLEAR_DAY_ASSUMPTIONS, type ClearDayEnergy } from "@/lib/heaters/sun";
import { Figure } from "./figure";

const FACINGS: Array<[string, number]> = [
  ["North", 0], ["North-east", 45], ["East", 90], ["South-east", 135], ["South", 180], ["South-west", 225], ["West", 270], ["North-west", 315],
];

export interface SunText {
  lat: string;
  bearing: string;
  date: string;
}

function check(value: number, min: number, max: number, label: string): string | undefined {
  if (!Number.isFinite(value)) return `${label} must be a number`;
  if (value < min || value > max) return `${label} must be between ${min} and ${max}`;
  return undefined;
}

/** What is wrong with the wall and day typed, or null when they can be used. */
export function checkSun(sun: SunText): Partial<Record<keyof SunText, string>> | null {
  const errors = {
    lat: check(Number(sun.lat), -66, 66, "Latitude"),
    bearing: check(Number(sun.bearing), 0, 360, "Wall facing"),
    date: /^\d{4}-\d{2}-\d{2}$/.test(sun.date) && !Number.isNaN(Date.parse(sun.date)) ? undefined : "Pick a date",
  };
  return errors.lat || errors.bearing || errors.date ? errors : null;
}

/** The wall the heater hangs on and the day: they set the headline's sunlight. */
export function SunFields({ sun, errors, onChange }: { sun: SunText; errors: Partial<Record<keyof SunText, string>>; onChange: (s: SunText) => void }) {
  return (
    <fieldset className="grid gap-x-4 sm:grid-cols-3">
      <legend className="mb-1 font-semibold">Your wall and the day</legend>
      <Field id="sun-lat" label="Latitude (°, south negative)" inputMode="decimal" value={sun.lat} error={errors.lat} onChange={(e) => onChange({ ...sun, lat: e.target.value })} />
      <SelectField
        id="sun-bearing"
        label="Wall faces"
        value={sun.bearing}
        onChange={(e) => onChange({ ...sun, bearing: e.target.value })}
        options={FACINGS.map(([name, deg]) => ({ value: String(deg), label: `${name} (${deg}°)` }))}
      />
      <Field id="sun-date" type="date" label="Day" value={sun.date} error={errors.date} onChange={(e) => onChange({ ...sun, date: e.target.value })} />
    </fieldset>
  );
}

/** Clear-day sunlight on the wall, and what the heater might make of it over the day. */
export function SunFigures({ day, heatKWh }: { day: ClearDayEnergy; heatKWh: number | null }) {
  return (
    <section aria-labelledby="sun-heading" className="flex flex-col gap-3 border-t border-paper-edge pt-4">
      <h3 id="sun-heading" className="text-base">A clear day on your wall</h3>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4" aria-live="polite">
        <Figure id="day-energy" label="Sunlight on the wall" value={`${formatNumber(day.kWhPerM2, 2)} kWh/m² a day`} />
        <Figure id="day-peak" label="Peak" value={`${formatNumber(day.peakWm2)} W/m²`} />
        <Figure id="day-hours" label="Sun on the wall" value={`${formatNumber(day.sunlitHours, 1)} h`} />
        <Figure id="day-heat" label="Heat for the room (estimate)" value={heatKWh === null ? "—" : `${formatNumber(heatKWh, 2)} kWh`} />
      </dl>
      <details className="text-sm text-ink-soft">
        <summary className="cursor-pointer font-semibold text-ink">What the clear-day figure assumes</summary>
        <ul className="mt-2 list-disc pl-5">
          {CLEAR_DAY_ASSUMPTIONS.map((a) => (
            <li key={a}>{a}</li>
          ))}
          <li>Heat for the room = sunlight on the wall × aperture × the efficiency at the peak, held all day: a rough upper figure.</li>
        </ul>
      </details>
    </section>
  );
}
