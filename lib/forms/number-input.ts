import { countOf, noun, type Noun } from "@/lib/plural";

/**
 * What a number box accepts, and the one message it gives when it can't.
 * The box keeps exactly what was typed; this decides whether that is a
 * number. Nothing is rounded, stripped or clamped: "−4", "2.5" (for a
 * count) and "abc" are refused with a message, never turned into 4, 25 or 0.
 * The server's zod schemas stay the final guard.
 */
export interface NumberSpec {
  /** What is counted (bags, cans) or, with `decimal`, weighed in ("kg"). */
  noun: Noun;
  /** Weights: a decimal with "." or ","; otherwise only whole numbers. */
  decimal?: boolean;
  /** Empty is refused (otherwise empty means "not given", null). */
  required?: boolean;
  min?: number;
  max?: number;
  /** Shown in the message: "like 3". */
  example?: string;
  /** The message for what is not a number, when the noun's own would not read well (money). */
  message?: string;
  /** How a limit reads in the range messages, when not "500 bags" or "5,000 kg". */
  amount?: (n: number) => string;
}

export type NumberParse = { ok: true; value: number | null } | { ok: false; error: string };

// Digits only; a decimal may have one "." or "," with digits after it ("4.5", "4,5", ",5").
const WHOLE = /^\d+$/;
const DECIMAL = /^(?:\d+(?:[.,]\d+)?|[.,]\d+)$/;
const THOUSANDS_OR_DECIMAL = /^[1-9]\d{0,2},\d{3}$/;
// Spaces a phone keyboard or a paste can add around the number.
const EDGE_SPACE = /^[\s\u00a0\u202f]+|[\s\u00a0\u202f]+$/g;

/** The message for anything that is not a number this box takes. */
export function numberMessage(spec: NumberSpec): string {
  if (spec.message) return spec.message;
  if (spec.decimal) return `Enter a weight in ${spec.noun.other}, like ${spec.example ?? "4.5"}.`;
  return `Enter a whole number of ${spec.noun.other}, like ${spec.example ?? "3"}.`;
}

const amount = (n: number, spec: NumberSpec) => spec.amount ? spec.amount(n) : (spec.decimal ? `${n.toLocaleString("en-GB")} ${spec.noun.other}` : countOf(n, spec.noun));

export function parseNumberInput(raw: string, spec: NumberSpec): NumberParse {
  const text = raw.replace(EDGE_SPACE, "");
  if (text === "") return spec.required ? { ok: false, error: numberMessage(spec) } : { ok: true, value: null };
  if (!(spec.decimal ? DECIMAL : WHOLE).test(text)) return { ok: false, error: numberMessage(spec) };
  // "1,234" is a thousands separator to some and a decimal comma to others: ask, never guess.
  if (spec.decimal && THOUSANDS_OR_DECIMAL.test(text)) {
    return { ok: false, error: `Is that ${text.replace(",", "")} or ${text.replace(",", ".")}? Type it without the comma, or with a dot for the decimals.` };
  }
  const value = Number(text.replace(",", "."));
  if (!Number.isFinite(value) || (!spec.decimal && !Number.isSafeInteger(value))) {
    return { ok: false, error: spec.max !== undefined ? `Enter no more than ${amount(spec.max, spec)}.` : numberMessage(spec) };
  }
  if (spec.min !== undefined && value < spec.min) return { ok: false, error: `Enter at least ${amount(spec.min, spec)}.` };
  if (spec.max !== undefined && value > spec.max) return { ok: false, error: `Enter no more than ${amount(spec.max, spec)}.` };
  return { ok: true, value };
}

/** The error for a box, or undefined; an empty optional box has none. */
export function numberError(raw: string, spec: NumberSpec): string | undefined {
  const p = parseNumberInput(raw, spec);
  return p.ok ? undefined : p.error;
}

/**
 * Parses several boxes at once for a form's submit: the values, and the
 * errors by field name (empty when every box is fine).
 */
export function parseNumberInputs<K extends string>(boxes: Record<K, [raw: string, spec: NumberSpec]>): {
  values: Record<K, number | null>;
  errors: Partial<Record<K, string>>;
} {
  const values = {} as Record<K, number | null>;
  const errors: Partial<Record<K, string>> = {};
  for (const key of Object.keys(boxes) as K[]) {
    const [raw, spec] = boxes[key];
    const p = parseNumberInput(raw, spec);
    if (p.ok) values[key] = p.value;
    else {
      values[key] = null;
      errors[key] = p.error;
    }
  }
  return { values, errors };
}

/** One step up or down from what is typed; null when the box does not hold a number to step from. */
export function stepNumberInput(raw: string, spec: NumberSpec, by: number): string | null {
  const p = parseNumberInput(raw, { ...spec, min: undefined, max: undefined, required: false });
  if (!p.ok) return null;
  let next = (p.value ?? 0) + by;
  if (spec.min !== undefined) next = Math.max(spec.min, next);
  else next = Math.max(0, next);
  if (spec.max !== undefined) next = Math.min(spec.max, next);
  return String(next);
}

// The app's count and weight boxes, so a form and its tests use one spec.
const cans = (extra: Partial<NumberSpec> = {}): NumberSpec => ({ noun: noun("can"), max: 1_000_000, ...extra });
export const NUMBER_SPECS = {
  haulBags: { noun: noun("bag"), required: true, min: 0, max: 500 },
  haulWeightKg: { noun: noun("kg", "kg"), decimal: true, min: 0, max: 5_000 },
  stopBags: { noun: noun("bag"), required: true, min: 0, max: 500 },
  goodCans: cans({ required: true, min: 0 }),
  rejectedCans: cans({ required: true, min: 0 }),
  batchCans: cans({ required: true, min: 1, example: "40" }),
  lostCans: cans({ required: true, min: 0 }),
  recycledCans: cans({ required: true, min: 1, example: "40" }),
  recycledWeightKg: { noun: noun("kg", "kg"), decimal: true, min: 0, max: 5_000 },
  countedCans: cans({ min: 0, example: "120" }),
  claimCans: cans({ required: true, min: 1, example: "40" }),
  capacityBags: { noun: noun("bag"), required: true, min: 1, max: 100, example: "6" },
  pledgeBags: { noun: noun("bag"), required: true, min: 1, max: 50 },
} satisfies Record<string, NumberSpec>;

