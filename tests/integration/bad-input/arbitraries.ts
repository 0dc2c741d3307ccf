import fc from "fast-check";

// Bodies that are invalid by construction: a valid template with one field
// corrupted or removed (plus extra junk fields riding along), or a body that
// is not a JSON object at all. Each field says which values it can never accept.
export type FieldKind =
  | { kind: "count"; min: 0 | 1; max: number; required: boolean }
  | { kind: "amount"; max: number; required: boolean } // non-negative number, null allowed
  | { kind: "choice"; values: string[]; required: boolean } // enum or uuid: any other string is wrong
  | { kind: "ids"; required: boolean }
  | { kind: "rejects"; required: boolean }
  | { kind: "text"; max: number; required: boolean } // any text: a NUL byte or too long is never accepted
  | { kind: "day"; required: boolean } // YYYY-MM-DD within 2000–2100
  | { kind: "moment"; required: boolean } // ISO date-time with offset within 2000–2100
  | { kind: "weight"; required: boolean } // a haul's kg: none under one can (≈ 13.3 g)
  | { kind: "loss"; required: boolean }; // { reason: a loss reason, quantity ≥ 1 }

const SQLISH = ["'; drop table ledger_lines; --", "1 OR 1=1", "\" or \"\"=\"", "1; update stage_balances set quantity = 0", "$$; select pg_sleep(5); $$", "' union select * from users --"];
const HTMLISH = ["<script>alert(1)</script>", "<img src=x onerror=alert(1)>", "\"><svg onload=alert(1)>", "javascript:alert(1)", "&lt;b&gt;&amp;", "{{7*7}}", "${7*7}"];
const ODD = ["\u0000", "\u202e\u0644\u0627", "\ud83e\udd6b\u200d\u2642\ufe0f", "\ud800", "Ω≈ç√∫", "\ufeffbom", "𝕮𝖆𝖓", "\r\n\t", "ﷺ", "ǅ", "ＡＢＣ", "١٢٣"];

export const oddText = fc.oneof(
  fc.constantFrom(...SQLISH, ...HTMLISH, ...ODD),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: "binary", maxLength: 40 }),
  fc.string({ unit: "grapheme", maxLength: 40 }),
  fc.string({ minLength: 5_000, maxLength: 30_000 }),
);

const wrongType = fc.oneof(fc.boolean(), fc.constant(null), fc.array(fc.integer(), { maxLength: 3 }), fc.dictionary(fc.string({ maxLength: 5 }), fc.integer(), { maxKeys: 2 }));
const hugeNumber = fc.oneof(fc.double({ min: 1e7, max: 1e300, noNaN: true }), fc.constantFrom(Number.MAX_SAFE_INTEGER + 2, 2 ** 63, 1e21));
const negative = fc.oneof(fc.integer({ min: -2_000_000_000, max: -1 }), fc.double({ min: -1e300, max: -1e-9, noNaN: true }));
const fractional = fc.integer({ min: 0, max: 1000 }).chain((n) => fc.double({ min: n + 0.001, max: n + 0.999, noNaN: true }));
const numericString = fc.integer({ min: 1, max: 50 }).map(String);

/** Text with a NUL byte somewhere in it (PostgreSQL text cannot hold one). */
export const nulText = fc
  .tuple(fc.oneof(fc.constantFrom("", "Ada", "Larkhollow Library porch", "two bags"), fc.string({ maxLength: 30 })), fc.nat(), fc.constantFrom("\u0000", "\u0000\u0000", "a\u0000"))
  .map(([text, at, nul]) => {
    const i = at % (text.length + 1);
    return text.slice(0, i) + nul + text.slice(i);
  });

// Years that are no can drive's: 0000 is not even a PostgreSQL date; 1900 and 9999 are.
const farYear = fc.oneof(fc.constantFrom("0000", "1900", "9999", "1999", "2101"), fc.integer({ min: 0, max: 1999 }).map((y) => String(y).padStart(4, "0")), fc.integer({ min: 2101, max: 9999 }).map(String));
const monthDay = fc.tuple(fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 28 })).map(([m, d]) => `${String(m).padStart(2, "0")}-${String(d).padStart(2, "0")}`);
export const extremeDay = fc.tuple(farYear, monthDay).map(([y, md]) => `${y}-${md}`);
export const extremeMoment = fc
  .tuple(extremeDay, fc.constantFrom("T00:00:00Z", "T12:30:00.000Z", "T23:59:59+14:00", "T00:00:00-12:00"))
  .map(([d, t]) => d + t)
  // An offset can carry 2101-01-01T00:00+14:00 back into 2100 (UTC), which is allowed.
  .filter((v) => !(Date.parse(v) >= Date.UTC(2000, 0, 1) && Date.parse(v) < Date.UTC(2101, 0, 1)));
/** 1 mg to 10 g: every one rounds to no cans. */
export const tinyWeight = fc.double({ min: 1e-6, max: 0.01, noNaN: true });

/** Only the values this run adds for finding 8: NUL bytes, far dates, weights under one can. */
export function edgeValue(f: FieldKind): fc.Arbitrary<unknown> | null {
  switch (f.kind) {
    case "text":
      return nulText;
    case "day":
      return extremeDay;
    case "moment":
      return extremeMoment;
    case "weight":
      return tinyWeight;
    default:
      return null;
  }
}

export function badValue(f: FieldKind): fc.Arbitrary<unknown> {
  switch (f.kind) {
    case "count":
      return fc.oneof(negative, fractional, fc.double({ min: f.max + 1, max: 1e300, noNaN: true }), hugeNumber.filter((n) => n > f.max), numericString, oddText, wrongType.filter((v) => v !== undefined), ...(f.min === 1 ? [fc.constant(0)] : []));
    case "amount":
      return fc.oneof(negative, fc.double({ min: f.max + 0.5, max: 1e300, noNaN: true }), numericString, oddText, fc.boolean(), fc.array(fc.integer(), { maxLength: 3 }));
    case "choice":
      return fc.oneof(oddText.filter((s) => !f.values.includes(s)), fc.integer(), wrongType);
    case "ids":
      return fc.oneof(
        fc.constant([]),
        fc.array(oddText, { minLength: 1, maxLength: 3 }),
        fc.array(fc.uuid(), { minLength: 101, maxLength: 120 }),
        fc.uuid().map((id) => [id, id]),
        oddText,
        fc.integer(),
        fc.constant(null),
      );
    case "rejects":
      return fc.oneof(
        fc.record({ dented: fc.oneof(negative, fractional, numericString, oddText) }),
        fc.array(fc.integer({ min: 1, max: 5 }), { minLength: 1, maxLength: 3 }),
        oddText,
        fc.integer(),
      );
    case "text":
      return fc.oneof({ weight: 3, arbitrary: nulText }, { weight: 1, arbitrary: fc.string({ minLength: f.max + 1, maxLength: f.max + 200 }).filter((t) => t.trim().length > f.max) }, { weight: 1, arbitrary: wrongType.filter((v) => v !== null) }, { weight: 1, arbitrary: fc.integer() });
    case "day":
      return fc.oneof({ weight: 3, arbitrary: extremeDay }, { weight: 1, arbitrary: fc.constantFrom("2026-02-30", "2026-13-01", "26-11-01", "tomorrow", "") }, { weight: 1, arbitrary: fc.integer() });
    case "moment":
      return fc.oneof({ weight: 3, arbitrary: extremeMoment }, { weight: 1, arbitrary: fc.constantFrom("2026-12-02", "2026-12-02T09:30:00", "now", "") }, { weight: 1, arbitrary: fc.integer() });
    case "weight":
      return fc.oneof({ weight: 3, arbitrary: tinyWeight }, negative, fc.double({ min: 5_000.5, max: 1e300, noNaN: true }), numericString, oddText, fc.boolean());
    case "loss":
      return fc.oneof(
        fc.record({ reason: fc.oneof(oddText, fc.constantFrom("dented", "damaged", "stockCount")), quantity: fc.constant(1) }),
        fc.record({ reason: fc.constant("damagedWashing"), quantity: fc.oneof(negative, fractional, fc.constant(0), numericString, oddText) }),
        fc.record({ quantity: fc.integer({ min: 1, max: 5 }) }),
        oddText,
        fc.integer(),
        fc.array(fc.integer({ min: 1, max: 5 }), { minLength: 1, maxLength: 3 }),
      );
  }
}

/** Non-object or unparseable bodies, sent as raw text. */
export const junkBody: fc.Arbitrary<string> = fc.oneof(
  oddText.map((s) => `{${s}`),
  oddText,
  fc.constantFrom("", "null", "[]", "true", "42", "\"text\"", "{\"a\":", "undefined", "NaN", "{'quantity': 1}", "<xml/>", "quantity=1"),
  fc.jsonValue({ maxDepth: 2 }).filter((v) => v === null || typeof v !== "object" || Array.isArray(v)).map((v) => JSON.stringify(v)),
);

/** A template with one field corrupted or removed and up to three junk fields added. */
export function corrupted(template: Record<string, unknown>, fields: Record<string, FieldKind>, edgeOnly = false): fc.Arbitrary<string> {
  const keys = Object.keys(fields).filter((k) => !edgeOnly || edgeValue(fields[k]!) !== null);
  const extra = fc.dictionary(oddText.map((s) => s.slice(0, 60)).filter((k) => !(k in template) && k !== "__proto__"), fc.oneof(oddText, fc.integer(), wrongType), { maxKeys: 3 });
  return fc
    .constantFrom(...keys)
    .chain((key) => {
      const f = fields[key];
      const drop = f.required ? fc.constant<"drop" | "bad">("drop") : fc.constant<"drop" | "bad">("bad");
      if (edgeOnly) return fc.tuple(fc.constant(key), fc.constant<"drop" | "bad">("bad"), edgeValue(f)!, extra);
      return fc.tuple(fc.constant(key), fc.oneof({ weight: 1, arbitrary: drop }, { weight: 4, arbitrary: fc.constant<"drop" | "bad">("bad") }), badValue(f), extra);
    })
    .map(([key, how, value, junk]) => {
      const body: Record<string, unknown> = { ...junk, ...template };
      if (how === "drop") delete body[key];
      else body[key] = value;
      return JSON.stringify(body);
    });
}
