"use client";

import { ISO_WEEKDAY_LABELS, ISO_WEEKDAY_SHORT, type OpeningSpan } from "@/lib/drives/opening-hours";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/field";

const DAYS = [1, 2, 3, 4, 5, 6, 7] as const;

// Structured opening hours (days and times), enough to answer "open on that day?"
// (lib/drives/opening-hours.ts; ISO 8601 weekdays, 1 = Monday). The spans travel in
// one hidden field as JSON; the free-text hours box beside it stays for notes.
export function OpeningHoursInput({ value, onChange, error }: { value: OpeningSpan[]; onChange: (v: OpeningSpan[]) => void; error?: string }) {
  const set = (i: number, span: OpeningSpan) => onChange(value.map((s, k) => (k === i ? span : s)));
  return (
    <fieldset className="flex flex-col gap-2 rounded-lg border border-paper-edge p-3" aria-describedby="dp-opening-error">
      <legend className="px-1 font-semibold">Open on these days</legend>
      <input type="hidden" name="openingHours" value={JSON.stringify(value)} />
      {value.length === 0 ? <p className="text-sm text-ink-faint">No days recorded: runs get no warning about this drop point being closed.</p> : null}
      {value.map((span, i) => (
        <div key={i} className="flex flex-col gap-2 rounded-lg bg-paper-deep p-2" role="group" aria-label={`Opening times ${i + 1}`}>
          <div className="flex flex-wrap gap-1">
            {DAYS.map((d) => (
              <label key={d} className="flex min-h-11 min-w-11 items-center gap-1 rounded border border-ink/30 bg-white px-2">
                <input
                  type="checkbox"
                  className="h-5 w-5"
                  checked={span.days.includes(d)}
                  aria-label={ISO_WEEKDAY_LABELS[d]}
                  onChange={(e) => set(i, { ...span, days: e.target.checked ? [...span.days, d].sort((a, b) => a - b) : span.days.filter((x) => x !== d) })}
                />
                <span aria-hidden="true">{ISO_WEEKDAY_SHORT[d]}</span>
              </label>
            ))}
          </div>
          <div className="flex flex-wrap items-end gap-2">
            <label className="flex flex-col gap-1 font-semibold">
              Opens
              <input type="time" className="min-h-11 rounded-lg border-2 border-ink/40 bg-white px-3" value={span.opens} onChange={(e) => set(i, { ...span, opens: e.target.value })} />
            </label>
            <label className="flex flex-col gap-1 font-semibold">
              Closes
              <input type="time" className="min-h-11 rounded-lg border-2 border-ink/40 bg-white px-3" value={span.closes} onChange={(e) => set(i, { ...span, closes: e.target.value })} />
            </label>
            <Button type="button" variant="quiet" onClick={() => onChange(value.filter((_, k) => k !== i))}>Remove these times</Button>
          </div>
        </div>
      ))}
      <Button type="button" variant="secondary" className="self-start" onClick={() => onChange([...value, { days: [], opens: "", closes: "" }])}>
        Add opening times
      </Button>
      <FieldError id="dp-opening" error={error} />
    </fieldset>
  );
}
