"use client";

import { Button } from "@/components/ui/button";
import type { FieldErrors } from "@/lib/api/errors";
import { CAN_GRID_DEFAULTS_MM, type LengthUnit } from "@/lib/heaters/grid-input";
import { defaultText, type GlazingDraft } from "./plan-form-state";

const COVERS = [
  ["chamber", "Only the can chamber (manifolds outside it)"],
  ["full", "Chamber and both manifolds"],
] as const;

const INPUT = "min-h-11 w-full rounded-lg border-2 bg-white px-3 py-2";

/** One row per glazing sheet to compare, each with its own coverage and manifolds; the chosen row drives the preview, heat and materials. */
export function GlazingOptionsFields({
  options,
  errors,
  problems,
  unit,
  selected,
  onChange,
  onSelect,
}: {
  options: GlazingDraft[];
  errors: FieldErrors[];
  /** Per sheet: why it holds no cans (too narrow or too short), if so. */
  problems: string[][];
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
            <div className="mt-2 grid gap-3 sm:grid-cols-[2fr_1fr]">
              <fieldset className="flex flex-col">
                <legend className="text-sm font-semibold">This sheet covers</legend>
                {COVERS.map(([value, text]) => (
                  <label key={value} className="flex min-h-11 items-center gap-2">
                    <input
                      type="radio"
                      id={`${id}-coverage-${value}`}
                      name={`${id}-coverage`}
                      value={value}
                      checked={o.coverage === value}
                      onChange={() => update(i, { coverage: value })}
                      className="h-5 w-5"
                    />
                    {text}
                  </label>
                ))}
              </fieldset>
              <label className="flex flex-col gap-1">
                <span className="text-sm font-semibold">Manifold height, each ({unit})</span>
                <input
                  id={`${id}-manifold`}
                  inputMode="decimal"
                  placeholder={defaultText(CAN_GRID_DEFAULTS_MM.manifoldHeight, unit)}
                  className={`${INPUT} ${e.manifoldHeight ? "border-alarm" : "border-ink/40"}`}
                  value={o.manifoldHeight}
                  aria-invalid={e.manifoldHeight ? true : undefined}
                  aria-describedby={`${id}-manifold-hint ${id}-manifold-error`}
                  onChange={(ev) => update(i, { manifoldHeight: ev.target.value })}
                />
                <span id={`${id}-manifold-hint`} className="text-sm text-ink-soft">
                  Air boxes above and below the cans. Blank = {defaultText(CAN_GRID_DEFAULTS_MM.manifoldHeight, unit)} {unit}.
                </span>
                <span id={`${id}-manifold-error`} aria-live="polite" className="text-sm font-semibold text-alarm">{e.manifoldHeight ?? ""}</span>
              </label>
            </div>
            {(problems[i] ?? []).map((p) => (
              <p key={p} role="status" className="mt-2 border-l-4 border-sun bg-sun-soft px-3 py-1 font-semibold" data-testid="fit-problem">
                {p}
              </p>
            ))}
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
            onChange([...options, { key, label: `Sheet ${String.fromCharCode(64 + Math.min(26, options.length + 1))}`, width: "", height: "", coverage: "chamber", manifoldHeight: "" }]);
          }}
        >
          Add another sheet size
        </Button>
      ) : null}
    </div>
  );
}
