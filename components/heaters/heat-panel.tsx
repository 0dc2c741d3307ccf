"use client";

import { useState } from "react";
import { Field } from "@/components/ui/field";
import { fieldErrorsOf } from "@/lib/api/errors";
import { formatNumber, formatPercent } from "@/lib/heaters/format";
import { computeHeatOutput, heatAtPeak, RATING_IRRADIANCE_WM2, type HeatOutput } from "@/lib/heaters/heat";
import type { HeatOutputInput, heatOutputInputSchema } from "@/lib/heaters/schemas";
import { clearDayEnergy } from "@/lib/heaters/sun";
import { Figure } from "./figure";
import { PendingChecks } from "./pending-checks";
import { checkSun, SunFields, SunFigures, type SunText } from "./sun-panel";

// 1 CFM in m³/h: 0.3048³ m³ × 60 (exact foot, NIST SP 811).
const M3H_PER_CFM = 0.3048 ** 3 * 60;

export const INITIAL_HEAT = { irradianceWm2: String(RATING_IRRADIANCE_WM2), eta0: "0.7", a1: "5", inletC: "18", ambientC: "5", airflowM3h: "170" };
type HeatText = typeof INITIAL_HEAT;

const LABELS: Record<keyof HeatText, [string, string]> = {
  irradianceWm2: ["Reference sunlight for the rating figure (W/m²)", "800 is a test-bench style figure, not what your wall gets"],
  eta0: ["Optical efficiency η0 (0–1)", "Share of sunlight caught with no heat loss; 0.6–0.75 for a glazed can collector"],
  a1: ["Heat loss coefficient a1 (W/(m²·K))", "How fast the box loses heat per degree above outdoors"],
  inletC: ["Room air in (°C)", ""],
  ambientC: ["Outdoors (°C)", ""],
  airflowM3h: ["Fan airflow (m³/h)", "170 m³/h is about 100 CFM"],
};

type HeatCheck = { success: true; data: HeatOutputInput } | { success: false; error: ReturnType<typeof heatOutputInputSchema.safeParse>["error"] & {} } | { success: false; pending: true };

/**
 * The heat figures checked with the schema once it has loaded. Before that,
 * only the opening figures count (a unit test checks them against the schema),
 * with the grid's computed area inside the schema's (0, 100] m²; anything
 * typed waits for the schema.
 */
function checkHeat(schema: typeof heatOutputInputSchema | null, text: HeatText, value: Record<string, number | undefined>): HeatCheck {
  if (schema) return schema.safeParse(value) as HeatCheck;
  const area = value.apertureAreaM2!;
  if (text === INITIAL_HEAT && Number.isFinite(area) && area > 0 && area <= 100) return { success: true, data: value as HeatOutputInput };
  return { success: false, pending: true };
}

/**
 * Useful heat and air rise for the chosen grid. The headline is at the
 * clear-day peak sunlight on the chosen wall and day; the fixed reference
 * sunlight gives a rating-style figure beside it, labelled as such.
 */
export function HeatPanel({
  apertureAreaM2,
  latitude,
  today,
  schema,
  failed,
}: {
  apertureAreaM2: number;
  latitude: number;
  today: string;
  /** null until the planner's checks have loaded */
  schema: typeof heatOutputInputSchema | null;
  failed: boolean;
}) {
  const [text, setText] = useState<HeatText>(INITIAL_HEAT);
  const [sun, setSun] = useState<SunText>({ lat: String(latitude), bearing: latitude >= 0 ? "180" : "0", date: today });
  const raw = Object.fromEntries(Object.entries(text).map(([k, v]) => [k, v.trim() === "" ? undefined : Number(v.replace(",", "."))]));
  const parsed = checkHeat(schema, text, { ...raw, apertureAreaM2 });
  const errors = parsed.success || !("error" in parsed) ? {} : fieldErrorsOf(parsed.error);
  const rating = parsed.success ? computeHeatOutput(parsed.data) : null;
  const sunErrors = checkSun(sun);
  const day = sunErrors ? null : clearDayEnergy({ latitude: Number(sun.lat), date: new Date(sun.date), facingBearing: Number(sun.bearing) });
  const peak = parsed.success && day ? heatAtPeak(parsed.data, day.peakWm2) : null;

  return (
    <div className="flex flex-col gap-4">
      <SunFields sun={sun} errors={sunErrors ?? {}} onChange={setSun} />
      {"pending" in parsed ? <PendingChecks failed={failed} /> : null}
      {errors.apertureAreaM2 ? <p className="text-ink-soft">Fix the grid above first: {errors.apertureAreaM2}</p> : null}
      {peak && day ? (
        <section aria-labelledby="heat-headline" aria-live="polite" className="rounded-card border-2 border-ember p-3">
          <h3 id="heat-headline" className="text-base">
            On a clear day at its peak: {formatNumber(day.peakWm2)} W/m² on this wall
          </h3>
          {day.peakWm2 > 0 ? null : <p className="text-ink-soft">The sun does not reach this wall on that day, so the heater makes no heat.</p>}
          <HeatFigures out={peak} prefix="" />
        </section>
      ) : null}
      {rating ? (
        <section aria-labelledby="heat-rating" className="rounded-card border border-paper-edge p-3">
          <h3 id="heat-rating" className="text-base">
            Rating-style figure at a fixed {formatNumber(parsed.success ? parsed.data.irradianceWm2 : RATING_IRRADIANCE_WM2)} W/m²
          </h3>
          <p className="text-sm text-ink-soft">For comparing designs on paper, like a test-bench rating; it is not what your wall receives.</p>
          <HeatFigures out={rating} prefix="rating-" />
        </section>
      ) : null}
      {day ? <SunFigures day={day} heatKWh={peak ? day.kWhPerM2 * apertureAreaM2 * peak.efficiency : null} /> : null}
      <div className="grid gap-x-4 sm:grid-cols-2 lg:grid-cols-3">
        {(Object.keys(INITIAL_HEAT) as Array<keyof HeatText>).map((key) => (
          <Field
            key={key}
            id={`heat-${key}`}
            label={LABELS[key][0]}
            hint={LABELS[key][1] || undefined}
            inputMode="decimal"
            value={text[key]}
            error={errors[key]}
            onChange={(e) => setText({ ...text, [key]: e.target.value })}
          />
        ))}
      </div>
      <details className="text-sm text-ink-soft">
        <summary className="min-h-11 cursor-pointer py-2.5 font-semibold text-ink">What this estimate assumes</summary>
        <ul className="mt-2 list-disc pl-5">
          <li>Efficiency η = η0 − a1·(room − outdoors)/sunlight, never below zero: a straight-line collector model.</li>
          <li>The headline uses the highest clear-day sunlight on the chosen wall and day; the rest of the day gives less.</li>
          <li>Aperture = the area the cans cover ({formatNumber(apertureAreaM2, 3)} m²), not the whole sheet.</li>
          <li>Air at 1.2 kg/m³ and 1005 J/(kg·K); the fan runs steadily ({formatNumber((Number(text.airflowM3h) || 0) / M3H_PER_CFM)} CFM).</li>
          <li>Steady sunshine; real output varies with cloud, dust on the glazing and leaks in the box.</li>
        </ul>
      </details>
    </div>
  );
}

function HeatFigures({ out, prefix }: { out: HeatOutput; prefix: string }) {
  return (
    <dl className="mt-2 grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4">
      <Figure id={`${prefix}efficiency`} label="Collector efficiency" value={formatPercent(out.efficiency)} />
      <Figure id={`${prefix}useful`} label="Useful heat (estimate)" value={`${formatNumber(out.usefulW)} W · ${formatNumber(out.usefulBtuh)} BTU/h`} />
      <Figure id={`${prefix}rise`} label="Air temperature rise" value={`${formatNumber(out.airRiseC, 1)} °C`} />
      <Figure id={`${prefix}outlet`} label="Air out" value={`${formatNumber(out.outletC, 1)} °C`} />
    </dl>
  );
}
