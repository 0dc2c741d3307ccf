import { AppError } from "./errors";

// PostgreSQL refusals that mean the request, not the server, was wrong.
// SQLSTATE codes from the PostgreSQL manual, appendix A "PostgreSQL Error Codes".
const CONFLICT: Record<string, string> = {
  "23505": "That already exists, or was just recorded by someone else. Reload to see it.",
  "23P01": "That overlaps with something already recorded. Reload to see it.",
  "40001": "Someone else changed this at the same moment. Try again.",
  "40P01": "Someone else changed this at the same moment. Try again.",
};
const INVALID: Record<string, string> = {
  "23503": "That refers to a record that does not exist (or no longer does).",
  "23502": "A required value is missing.",
  "23514": "A value is outside what Cantrove can record.",
  "22001": "A text is too long.",
  "22003": "A number is too large or too small.",
  "22007": "A date or time is not valid.",
  "22008": "A date or time is outside what Cantrove can record.",
  "22P02": "A value has the wrong form.",
  "22021": "A text holds characters that cannot be stored.",
  "22P05": "A text holds characters that cannot be stored.",
};

/** The AppError for a database refusal caused by the request, or null for anything else. */
export function appErrorFromDatabase(error: unknown): AppError | null {
  const code = (error as { code?: unknown } | null)?.code;
  if (typeof code !== "string") return null;
  if (CONFLICT[code]) return new AppError("conflict", CONFLICT[code]);
  if (INVALID[code]) return new AppError("invalid_input", INVALID[code], { fields: { _: INVALID[code] } });
  return null;
}
