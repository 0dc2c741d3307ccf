// A queued entry the server refused can be corrected where it is listed and sent
// again: the numbers it carries (bags, weight, cans) are offered in boxes, those
// the server named first. The corrected copy keeps the time it was entered and
// its place in the queue, and goes under a NEW Idempotency-Key: the refusal is
// stored under the old one (lib/api/idempotency.ts), which would only replay it,
// and a different body under a used key is refused.

import { NUMBER_SPECS, parseNumberInput, type NumberSpec } from "@/lib/forms/number-input";
import type { OutboxItem } from "@/lib/ledger/browser-queue";

/** The numbers of the ledger's entries a volunteer may correct, with the box each gets. */
export const FIXABLE: Record<string, { label: string; spec: NumberSpec }> = {
  bags: { label: "Bags", spec: NUMBER_SPECS.haulBags },
  weightKg: { label: "Weight (kg)", spec: NUMBER_SPECS.haulWeightKg },
  good: { label: "Good cans", spec: NUMBER_SPECS.goodCans },
  quantity: { label: "Cans", spec: NUMBER_SPECS.batchCans },
};

/** The fields of a refused entry that can be corrected: those the server named, else every number it carries. */
export function fixableFields(body: unknown, named?: Record<string, string>): string[] {
  if (!body || typeof body !== "object" || Array.isArray(body)) return [];
  const b = body as Record<string, unknown>;
  const present = Object.keys(FIXABLE).filter((k) => typeof b[k] === "number" || (k === "weightKg" && b[k] === null));
  const pointed = present.filter((k) => named && k in named);
  return pointed.length ? pointed : present;
}

export type FixParse = { ok: true; values: Record<string, number | null> } | { ok: false; errors: Record<string, string> };

/** The boxes' text read as numbers, each by its own box's rules. */
export function parseFix(raw: Record<string, string>): FixParse {
  const values: Record<string, number | null> = {};
  const errors: Record<string, string> = {};
  for (const [k, text] of Object.entries(raw)) {
    const spec = FIXABLE[k]?.spec;
    if (!spec) continue;
    const parsed = parseNumberInput(text, spec);
    if (parsed.ok) values[k] = parsed.value;
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
