"use client";

import type { SuggestionRow } from "@/lib/runs/types";
import { countOf } from "@/lib/plural";

function fillLabel(s: SuggestionRow): string {
  const parts: string[] = [];
  if (s.reportedFill !== null) parts.push(`reported ${Math.round(s.reportedFill * 100)} % full`);
  if (s.daysSinceHaul === null) parts.push("never hauled");
  else if (s.daysSinceHaul < 1) parts.push("hauled today");
  else parts.push(`last haul ${countOf(Math.floor(s.daysSinceHaul), "day")} ago`);
  if (s.expectedFill !== null) parts.push(`expected about ${Math.round(Math.min(s.expectedFill, 9.99) * 100)} % full (estimate)`);
  return parts.join(" · ");
}

export function StopPicker({
  suggestions,
  selected,
  onToggle,
  error,
}: {
  suggestions: SuggestionRow[];
  selected: Set<string>;
  onToggle: (id: string) => void;
  error?: string;
}) {
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby="stops-error">
      <legend className="mb-1 font-semibold">Drop points to visit</legend>
      <p className="text-sm text-ink-faint">
        Most in need first: bins reported at least ¾ full since their last haul, then the longest since a haul.
      </p>
      <ul className="flex flex-col gap-2">
        {suggestions.map((s) => (
          <li key={s.id}>
            <label
              className={`flex cursor-pointer items-start gap-3 rounded-lg border-2 p-3 ${selected.has(s.id) ? "border-ember bg-ember-soft" : "border-paper-edge bg-white"}`}
            >
              <input
                type="checkbox"
                className="mt-1 h-5 w-5 accent-ember"
                checked={selected.has(s.id)}
                onChange={() => onToggle(s.id)}
              />
              <span className="flex flex-col">
                <span className="font-semibold">
                  {s.name}
                  {s.reportedFull ? <span className="ml-2 rounded bg-sun-soft px-1.5 text-sm text-sun">reported full</span> : null}
                  {!s.reportedFull && s.suggested ? <span className="ml-2 rounded bg-paper-deep px-1.5 text-sm text-ink-soft">suggested</span> : null}
                </span>
                <span className="text-sm text-ink-soft">{fillLabel(s)}</span>
                <span className="text-sm text-ink-faint">
                  {s.address} · {s.hours} · bin holds {countOf(s.capacityBags, "bag")}
                </span>
              </span>
            </label>
          </li>
        ))}
      </ul>
      <p id="stops-error" aria-live="polite" className="text-sm font-semibold text-alarm">
        {error ?? ""}
      </p>
    </fieldset>
  );
}
