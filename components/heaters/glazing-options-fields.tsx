"use client";

import { Button } from "@/components/ui/button";
import type { FieldErrors } from "@/lib/api/errors";
import type { LengthUnit } from "@/lib/heaters/schemas";
import type { GlazingDraft } from "./plan-form-state";

const INPUT = "min-h-11 w-full rounded-lg border-2 bg-white px-3 py-2";

/** One row per glazing sheet to compare; the chosen row drives the preview, heat and materials. */
export function GlazingOptionsFields({
  options,
  errors,
  unit,
  selected,
  onChange,
  onSelect,
}: {
  options: GlazingDraft[];
  errors: FieldErrors[];
  unit: LengthUnit;
  selected: number;
  onChange: (options: GlazingDraft[]) => void;
  onSelect: (index: number) => void;
}) {
  const update = (i: number, patch: Partial<GlazingDraft>) => onChange(options.map((o, j) => (j === i ? { ...o, ...patch } : o)));
  return (
    <div className="flex flex-col gap-3">
      {options.map((o, i) => {
        const e = errors[i] ?? {};
        const id = `sheet-${o.key}`;
        return (
          <fieldset key={o.key} className={`rounded-card border-2 p-3 ${selected === i ? "border-ember" : "border-paper-edge"}`}>
            <legend className="px-1 font-semibold">{o.label || `Sheet ${i + 1}`}</legend>
            <div className="grid grid-cols-2 gap-3 sm:grid-cols-[1fr_1fr_1fr_auto]">
              <label className="col-span-2 flex flex-col gap-1 sm:col-span-1">
                <span className="text-sm font-semibold">Name</span>
                <input className={`${INPUT} border-ink/40`} value={o.label} onChange={(ev) => update(i, { label: ev.target.value })} />
              </label>
              {(["width", "height"] as const).map((dim) => {
                const err = e[dim === "width" ? "glazingWidth" : "glazingHeight"];
                return (
                  <label key={dim} className="flex flex-col gap-1">
                    <span className="text-sm font-semibold">
                      {dim === "width" ? "Glazing width" : "Glazing height"} ({unit})
                    </span>
                    <input
                      id={`${id}-${dim}`}
                      inputMode="decimal"
                      className={`${INPUT} ${err ? "border-alarm" : "border-ink/40"}`}
                      value={o[dim]}
                      aria-invalid={err ? true : undefined}
                      aria-describedby={`${id}-${dim}-error`}
                      onChange={(ev) => update(i, { [dim]: ev.target.value })}
                    />
                    <span id={`${id}-${dim}-error`} aria-live="polite" className="text-sm font-semibold text-alarm">{err ?? ""}</span>
                  </label>
                );
              })}
              <div className="col-span-2 flex flex-wrap items-end gap-2 sm:col-span-1">
                <label className="flex min-h-11 items-center gap-2">
                  <input type="radio" name="plan-with" checked={selected === i} onChange={() => onSelect(i)} className="h-5 w-5" />
                  Plan with this
                </label>
                {options.length > 1 ? (
                  <Button type="button" variant="quiet" onClick={() => onChange(options.filter((_, j) => j !== i))} aria-label={`Remove ${o.label || `sheet ${i + 1}`}`}>
                    Remove
                  </Button>
                ) : null}
              </div>
            </div>
          </fieldset>
        );
      })}
      {options.length < 6 ? (
        <Button
          type="button"
          variant="secondary"
          className="self-start"
          onClick={() => {
            const key = Math.max(0, ...options.map((o) => o.key)) + 1;
            onChange([...options, { key, label: `Sheet ${String.fromCharCode(64 + Math.min(26, options.length + 1))}`, width: "", height: "" }]);
          }}
        >
          Add another sheet size
        </Button>
      ) : null}
    </div>
  );
}
