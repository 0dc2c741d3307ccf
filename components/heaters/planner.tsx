"use client";

import dynamic from "next/dynamic";
import { useState } from "react";
import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import type { FieldErrors } from "@/lib/api/errors";
import { fitProblems } from "@/lib/heaters/can-grid";
import { areaToM2 } from "@/lib/heaters/format";
import { resolveCanGridInput, type LengthUnit } from "@/lib/heaters/grid-input";
import { planSchemas, useLoadedSchemas } from "@/hooks/use-lazy-schemas";
import { GlazingComparison } from "./glazing-comparison";
import { GlazingOptionsFields } from "./glazing-options-fields";
import { GridFigures } from "./grid-figures";
import { GridPreview } from "./grid-preview";
import { HeatPanel } from "./heat-panel";
import { MaterialsPanel } from "./materials-panel";
import { convertText, evaluate, INITIAL_OPTIONS, INITIAL_SETTINGS, SETTING_FIELDS, type PlanSettings } from "./plan-form-state";
import { PendingChecks } from "./pending-checks";
import { PlanSettingsFields } from "./plan-settings-fields";
import type { DriveChoice } from "./save-plan";

// Only a signed-in builder or organiser can save, so only they load the saving form's code.
const SavePlan = dynamic(() => import("./save-plan").then((m) => m.SavePlan));

/**
 * The heater planner. Everything is computed in the browser with the same
 * pure functions the API uses, so the page and /api/plan/* always agree.
 */
export function Planner({ drives, canSave, latitude, today }: { drives: DriveChoice | null; canSave: boolean; latitude: number; today: string }) {
  const [settings, setSettings] = useState<PlanSettings>(INITIAL_SETTINGS);
  const [options, setOptions] = useState(INITIAL_OPTIONS);
  const [selected, setSelected] = useState(0);
  // The checks (zod) arrive after the first screen is drawn; until then only the opening sheets show results.
  const { schemas, failed } = useLoadedSchemas(planSchemas);
  const chosen = Math.min(selected, options.length - 1);
  const results = options.map((o) => evaluate(settings, o, schemas?.canGridInputSchema ?? null));
  const current = results[chosen];
  const settingErrors: FieldErrors = {};
  // Per-sheet fields (size, manifolds) show their errors beside the sheet; the rest under the shared settings.
  for (const r of results) if (!r.ok) for (const [k, v] of Object.entries(r.errors)) if (!k.startsWith("glazing") && k !== "manifoldHeight") settingErrors[k] ??= v;
  const problems = results.map((r) => (r.ok ? fitProblems(r.input) : []));
  const label = options[chosen].label || `Sheet ${chosen + 1}`;

  function setUnit(unit: LengthUnit) {
    if (unit === settings.unit) return;
    const next = { ...settings, unit };
    for (const key of SETTING_FIELDS) next[key] = convertText(settings[key], settings.unit, unit);
    setSettings(next);
    const conv = (t: string) => convertText(t, settings.unit, unit);
    setOptions(options.map((o) => ({ ...o, width: conv(o.width), height: conv(o.height), manifoldHeight: conv(o.manifoldHeight) })));
  }

  return (
    <div className="flex flex-col gap-5">
      <Card title="1. Glazing sheets">
        <fieldset className="mb-3 flex flex-wrap items-center gap-4">
          <legend className="mb-1 font-semibold">Measure in</legend>
          {(["in", "mm"] as const).map((u) => (
            <label key={u} className="flex min-h-11 items-center gap-2">
              <input type="radio" name="unit" value={u} checked={settings.unit === u} onChange={() => setUnit(u)} className="h-5 w-5" />
              {u === "in" ? "Inches" : "Millimetres"}
            </label>
          ))}
        </fieldset>
        <GlazingOptionsFields
          options={options}
          errors={results.map((r) => (r.ok ? {} : r.errors))}
          problems={problems}
          unit={settings.unit}
          selected={chosen}
          onChange={setOptions}
          onSelect={setSelected}
        />
      </Card>

      <Card title="2. Cans and frame (every sheet)">
        <PlanSettingsFields settings={settings} errors={settingErrors} onChange={setSettings} />
      </Card>

      <Card title={`3. The can grid for ${label}`}>
        {current.ok ? (
          <div className="grid gap-4 md:grid-cols-[1fr_18rem]">
            <div aria-live="polite" className="flex flex-col gap-3">
              {problems[chosen].map((p) => (
                <p key={p} className="border-l-4 border-sun bg-sun-soft px-3 py-2 font-semibold" data-testid="grid-fit-problem">
                  {p}
                </p>
              ))}
              <GridFigures grid={current.grid} />
            </div>
            <GridPreview plan={resolveCanGridInput(current.input)} grid={current.grid} title={`${label}: ${current.grid.columns} by ${current.grid.rows} cans`} />
          </div>
        ) : "pending" in current ? (
          <PendingChecks failed={failed} />
        ) : (
          <p className="text-ink-soft">Fix the highlighted fields above to see the grid; nothing you typed is lost.</p>
        )}
      </Card>

      <Card title="4. Compare the sheets">
        <GlazingComparison
          options={results.flatMap((r, i) => (r.ok ? [{ label: options[i].label || `Sheet ${i + 1}`, input: r.input }] : []))}
        />
      </Card>

      {current.ok ? (
        <>
          <Card title="5. Heat estimate">
            <HeatPanel
              apertureAreaM2={areaToM2(current.grid.apertureArea, current.grid.unit)}
              latitude={latitude}
              today={today}
              schema={schemas?.heatOutputInputSchema ?? null}
              failed={failed}
            />
          </Card>
          <Card title="6. Materials and cost">
            <MaterialsPanel input={current.input} />
          </Card>
        </>
      ) : null}

      <Card title="7. Save as a heater unit">
        {canSave && drives ? (
          <SavePlan input={current.input} choice={drives} planLabel={label} disabled={!current.ok} />
        ) : (
          <p className="text-ink-soft">
            Builders and organisers of a group can save this plan as a heater unit of a drive. <a href="/signin?next=/plan">Sign in</a> to save it;
            the planner itself works without an account.
          </p>
        )}
      </Card>

      <Notice tone="caution" title="Before you build">
        Cut cans and punched holes are sharp: wear gloves. Wear eye and hearing protection when grinding or punching. Use adhesives and
        high-temperature paint with good ventilation. Fit an over-temperature switch and a backdraft damper. Mains wiring is for a licensed
        electrician, and a wall opening must follow your local building code.
      </Notice>
    </div>
  );
}
