// Safe to import anywhere: no I/O. The small step from a form's FormData to
// the object a route's zod schema takes (used by action(), lib/api/action.ts).
import { AppError, type FieldErrors } from "@/lib/api/errors";
import { numberMessage, parseNumberInput, type NumberSpec } from "./number-input";

const DECIMAL = /^[-−]?\d+(\.\d+)?$/;

export interface FormShape {
  /** Boxes read with the app's number rule (NUMBER_SPECS), or "decimal" for a plain signed number (coordinates). */
  numbers?: Record<string, NumberSpec | "decimal">;
  /** Checkboxes: present → true, absent → false. */
  checkboxes?: readonly string[];
}

/** FormData's text entries; React's own `$ACTION_…` fields and files are left out. */
export function formValues(formData: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of formData.entries()) {
    if (typeof value === "string" && !key.startsWith("$ACTION")) values[key] = value;
  }
  return values;
}

/** The FormData step: numbers by the app's number rule, checkboxes as booleans; the rest stays text for zod. */
export function formInput(values: Record<string, string>, spec: FormShape): Record<string, unknown> {
  const out: Record<string, unknown> = { ...values };
  const fields: FieldErrors = {};
  for (const [key, rule] of Object.entries(spec.numbers ?? {})) {
    const raw = (values[key] ?? "").trim();
    if (rule === "decimal") {
      // Empty is "not given" (the schema says what is missing); text that is no number is refused as typed.
      if (raw !== "" && !DECIMAL.test(raw)) fields[key] = "Enter a number with a point, like 47.21 or −8.05.";
      out[key] = raw === "" ? undefined : Number(raw.replace("−", "-"));
      continue;
    }
    const parsed = parseNumberInput(raw, rule);
    if (!parsed.ok) fields[key] = parsed.error || numberMessage(rule);
    else out[key] = parsed.value ?? undefined;
  }
  for (const key of spec.checkboxes ?? []) out[key] = key in values;
  if (Object.keys(fields).length) throw new AppError("invalid_input", "Some fields need another look.", { fields });
  return out;
}

