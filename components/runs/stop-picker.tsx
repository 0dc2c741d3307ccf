"use client";

import type { SuggestionRow } from "@/lib/runs/types";
import { countOf } from "@/lib/plural";
import { describeOpeningHours, ISO_WEEKDAY_LABELS, isOpenOnDate, isoWeekday } from "@/lib/drives/opening-hours";

/** The weekday of a chosen day, or null while the box holds no real date. */
function weekdayOf(day: string | undefined): number | null {
  try {
    return day ? isoWeekday(day) : null;
  } catch {
    return null;
  }
}

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
  plannedOn,
}: {
  /** The run's day as chosen so far: a drop point closed that day by its hours is marked (a warning, never a block). */
  plannedOn?: string;
  suggestions: SuggestionRow[];
  selected: Set<string>;
  onToggle: (id: string) => void;
  error?: string;
}) {
  const weekday = weekdayOf(plannedOn);
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
                  {[s.address, describeOpeningHours(s.openingHours), s.hours].filter(Boolean).join(" · ")} · bin holds {countOf(s.capacityBags, "bag")}
                </span>
                {weekday !== null && isOpenOnDate(s.openingHours, plannedOn!) === false ? (
                  <span className="text-sm font-semibold text-alarm">Closed on {ISO_WEEKDAY_LABELS[weekday]}s by its opening hours</span>
                ) : null}
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
