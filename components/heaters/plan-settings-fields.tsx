"use client";

import { Field } from "@/components/ui/field";
import type { FieldErrors } from "@/lib/api/errors";
import { CAN_GRID_DEFAULTS_MM, DEFAULT_HOLES_PER_CAN } from "@/lib/heaters/grid-input";
import { defaultText, SETTING_FIELDS, type PlanSettings } from "./plan-form-state";

const LABEL: Record<(typeof SETTING_FIELDS)[number], [string, string]> = {
  canDiameter: ["Can diameter", "A standard 355 mL can is about 66 mm"],
  canLength: ["Can length (as stacked)", "Length each can adds to a column"],
  edgeClearance: ["Edge clearance", "Kept free on every side of the sheet"],
  frameAllowanceWidth: ["Frame allowance, width", "Added to the glazing (both sides together) for the outer box"],
  frameAllowanceHeight: ["Frame allowance, height", "Added to the height, top and bottom together"],
};

/** Can size, clearance, holes and frame allowances, shared by every glazing option (coverage and manifolds are per sheet). */
export function PlanSettingsFields({ settings, errors, onChange }: { settings: PlanSettings; errors: FieldErrors; onChange: (s: PlanSettings) => void }) {
  const u = settings.unit;
  return (
    <div className="flex flex-col gap-3">
      <div className="grid gap-x-4 sm:grid-cols-2 lg:grid-cols-3">
        {SETTING_FIELDS.map((key) => (
          <Field
            key={key}
            id={`plan-${key}`}
            label={`${LABEL[key][0]} (${u})`}
            hint={`${LABEL[key][1]}. Blank = ${defaultText(CAN_GRID_DEFAULTS_MM[key], u)} ${u}.`}
            placeholder={defaultText(CAN_GRID_DEFAULTS_MM[key], u)}
            inputMode="decimal"
            value={settings[key]}
            error={errors[key]}
            onChange={(e) => onChange({ ...settings, [key]: e.target.value })}
          />
        ))}
        <Field
          id="plan-holesPerCan"
          label="Holes per can"
          hint={`Punched in each can bottom. Blank = ${DEFAULT_HOLES_PER_CAN}.`}
          placeholder={String(DEFAULT_HOLES_PER_CAN)}
          inputMode="numeric"
          value={settings.holesPerCan}
          error={errors.holesPerCan}
          onChange={(e) => onChange({ ...settings, holesPerCan: e.target.value })}
        />
      </div>
    </div>
  );
}
