"use client";

import { useState } from "react";
import { Field } from "@/components/ui/field";
import { fieldErrorsOf } from "@/lib/api/errors";
import { formatNumber, formatPercent } from "@/lib/heaters/format";
import { computeHeatOutput } from "@/lib/heaters/heat";
import { heatOutputInputSchema } from "@/lib/heaters/schemas";
import { SunPanel } from "./sun-panel";

// 1 CFM in m³/h: 0.3048³ m³ × 60 (exact foot, NIST SP 811).
const M3H_PER_CFM = 0.3048 ** 3 * 60;

const INITIAL = { irradianceWm2: "800", eta0: "0.7", a1: "5", inletC: "18", ambientC: "5", airflowM3h: "170" };
type HeatText = typeof INITIAL;

const LABELS: Record<keyof HeatText, [string, string]> = {
  irradianceWm2: ["Sunlight on the glazing (W/m²)", "About 800 on a clear winter noon facing the sun"],
  eta0: ["Optical efficiency η0 (0–1)", "Share of sunlight caught with no heat loss; 0.6–0.75 for a glazed can collector"],
  a1: ["Heat loss coefficient a1 (W/(m²·K))", "How fast the box loses heat per degree above outdoors"],
  inletC: ["Room air in (°C)", ""],
  ambientC: ["Outdoors (°C)", ""],
  airflowM3h: ["Fan airflow (m³/h)", "170 m³/h is about 100 CFM"],
};

/** Useful heat and air rise for the chosen grid; an estimate, with what it assumes. */
export function HeatPanel({ apertureAreaM2, latitude, today }: { apertureAreaM2: number; latitude: number; today: string }) {
  const [text, setText] = useState<HeatText>(INITIAL);
  const raw = Object.fromEntries(
    Object.entries(text).map(([k, v]) => [k, v.trim() === "" ? undefined : Number(v.replace(",", "."))]),
  );
  const parsed = heatOutputInputSchema.safeParse({ ...raw, apertureAreaM2 });
  const errors = parsed.success ? {} : fieldErrorsOf(parsed.error);
  const out = parsed.success ? computeHeatOutput(parsed.data) : null;

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-x-4 sm:grid-cols-2 lg:grid-cols-3">
        {(Object.keys(INITIAL) as Array<keyof HeatText>).map((key) => (
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
      {errors.apertureAreaM2 ? <p className="text-ink-soft">Fix the grid above first: {errors.apertureAreaM2}</p> : null}
      {out ? (
        <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4" aria-live="polite">
          <Figure id="efficiency" label="Collector efficiency" value={formatPercent(out.efficiency)} />
          <Figure id="useful" label="Useful heat (estimate)" value={`${formatNumber(out.usefulW)} W · ${formatNumber(out.usefulBtuh)} BTU/h`} />
          <Figure id="rise" label="Air temperature rise" value={`${formatNumber(out.airRiseC, 1)} °C`} />
          <Figure id="outlet" label="Air out" value={`${formatNumber(out.outletC, 1)} °C`} />
        </dl>
      ) : null}
      <details className="text-sm text-ink-soft">
        <summary className="min-h-11 cursor-pointer py-2.5 font-semibold text-ink">What this estimate assumes</summary>
        <ul className="mt-2 list-disc pl-5">
          <li>Efficiency η = η0 − a1·(room − outdoors)/sunlight, never below zero: a straight-line collector model.</li>
          <li>Aperture = the area the cans cover ({formatNumber(apertureAreaM2, 3)} m²), not the whole sheet.</li>
          <li>Air at 1.2 kg/m³ and 1005 J/(kg·K); the fan runs steadily ({formatNumber((Number(text.airflowM3h) || 0) / M3H_PER_CFM)} CFM).</li>
          <li>Steady sunshine; real output varies with cloud, dust on the glazing and leaks in the box.</li>
        </ul>
      </details>
      <SunPanel apertureAreaM2={apertureAreaM2} efficiency={out?.efficiency ?? null} latitude={latitude} today={today} />
    </div>
  );
}

function Figure({ id, label, value }: { id: string; label: string; value: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm text-ink-faint">{label}</dt>
      <dd className="text-lg font-bold" data-figure={id}>
        {value}
      </dd>
    </div>
  );
}
