import fc from "fast-check";

// Bodies that are invalid by construction: a valid template with one field
// corrupted or removed (plus extra junk fields riding along), or a body that
// is not a JSON object at all. Each field says which values it can never accept.
export type FieldKind =
  | { kind: "count"; min: 0 | 1; max: number; required: boolean }
  | { kind: "amount"; max: number; required: boolean } // non-negative number, null allowed
  | { kind: "choice"; values: string[]; required: boolean } // enum or uuid: any other string is wrong
  | { kind: "ids"; required: boolean }
  | { kind: "rejects"; required: boolean };

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
export function corrupted(template: Record<string, unknown>, fields: Record<string, FieldKind>): fc.Arbitrary<string> {
  const keys = Object.keys(fields);
  const extra = fc.dictionary(oddText.map((s) => s.slice(0, 60)).filter((k) => !(k in template) && k !== "__proto__"), fc.oneof(oddText, fc.integer(), wrongType), { maxKeys: 3 });
  return fc
    .constantFrom(...keys)
    .chain((key) => {
      const f = fields[key];
      const drop = f.required ? fc.constant<"drop" | "bad">("drop") : fc.constant<"drop" | "bad">("bad");
      return fc.tuple(fc.constant(key), fc.oneof({ weight: 1, arbitrary: drop }, { weight: 4, arbitrary: fc.constant<"drop" | "bad">("bad") }), badValue(f), extra);
    })
    .map(([key, how, value, junk]) => {
      const body: Record<string, unknown> = { ...junk, ...template };
      if (how === "drop") delete body[key];
      else body[key] = value;
      return JSON.stringify(body);
    });
}
