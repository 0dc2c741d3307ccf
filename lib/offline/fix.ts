// A queued entry the server refused can be corrected where it is listed and sent
// again: the numbers it carries (bags, weight, cans) are offered in boxes, those
// the server named first. The corrected copy keeps the time it was entered and
// its place in the queue, and goes under a NEW Idempotency-Key: the refusal is
// stored under the old one (lib/api/idempotency.ts), which would only replay it,
// and a different body under a used key is refused.

import { NUMBER_SPECS, parseNumberInput, type NumberSpec } from "@/lib/forms/number-input";
import type { OutboxItem } from "@/lib/ledger/browser-queue";
import type { Units } from "@/lib/format/look";
import { weightEntry } from "@/lib/format/weight-entry";

/** The numbers of the ledger's entries a volunteer may correct, with the box each gets. */
export const FIXABLE: Record<string, { label: string; spec: NumberSpec }> = {
  bags: { label: "Bags", spec: NUMBER_SPECS.haulBags },
  weightKg: { label: "Weight (kg)", spec: NUMBER_SPECS.haulWeightKg },
  good: { label: "Good cans", spec: NUMBER_SPECS.goodCans },
  quantity: { label: "Cans", spec: NUMBER_SPECS.batchCans },
};

export interface FixBox {
  label: string;
  spec: NumberSpec;
  /** The entry's stored value as the box shows it. */
  shown: (stored: number) => number;
  /** What was typed, as the entry stores it. */
  stored: (typed: number | null) => number | null;
}

/**
 * The boxes in the group's units: the weight is typed in pounds in an imperial group, as
 * in the haul form (lib/format/weight-entry.ts), and stored in kg like every entry.
 */
export function fixBoxes(units: Units): Record<string, FixBox> {
  const same = { shown: (v: number) => v, stored: (v: number | null) => v };
  const weighed = weightEntry(units);
  const boxes: Record<string, FixBox> = Object.fromEntries(Object.entries(FIXABLE).map(([k, box]) => [k, { ...box, ...same }]));
  boxes.weightKg = { label: `Weight (${weighed.unit})`, spec: weighed.spec, shown: weighed.fromKg, stored: weighed.toKg };
  return boxes;
}

/**
 * The fields of a refused entry that can be corrected: those the server named; when it named
 * none, every number the entry carries; when it named only fields no box can correct, none.
 */
export function fixableFields(body: unknown, named?: Record<string, string>): string[] {
  if (!body || typeof body !== "object" || Array.isArray(body)) return [];
  const b = body as Record<string, unknown>;
  const present = Object.keys(FIXABLE).filter((k) => typeof b[k] === "number" || (k === "weightKg" && b[k] === null));
  if (!named || Object.keys(named).length === 0) return present;
  return present.filter((k) => k in named);
}

export type FixParse = { ok: true; values: Record<string, number | null> } | { ok: false; errors: Record<string, string> };

/** The boxes' text read as numbers, each by its own box's rules, in the units the entry stores. */
export function parseFix(raw: Record<string, string>, units: Units = "metric"): FixParse {
  const boxes = fixBoxes(units);
  const values: Record<string, number | null> = {};
  const errors: Record<string, string> = {};
  for (const [k, text] of Object.entries(raw)) {
    const box = boxes[k];
    if (!box) continue;
    const parsed = parseNumberInput(text, box.spec);
    if (parsed.ok) values[k] = box.stored(parsed.value);
    else errors[k] = parsed.error;
  }
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, values };
}

/** The corrected entry: the new numbers, the same time of entry, a new key, no attempts yet. */
export function correctedCopy(item: OutboxItem, values: Record<string, number | null>, key: string): OutboxItem {
  const body = { ...(item.body as Record<string, unknown>) };
  for (const [k, v] of Object.entries(values)) {
    if (!(k in FIXABLE)) continue;
    if (v === null) delete body[k];
    else body[k] = v;
  }
  const changes = Object.entries(values)
    .filter(([k]) => k in FIXABLE)
    .map(([k, v]) => `${FIXABLE[k]!.label.toLowerCase()} ${v ?? "none"}`)
    .join(", ");
  const base = item.label.replace(/ \(corrected: .*\)$/, "");
  return { ...item, key, body, label: changes ? `${base} (corrected: ${changes})` : base, attempts: 0, lastError: undefined };
}
