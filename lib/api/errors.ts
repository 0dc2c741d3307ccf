import type { ZodError } from "zod";

// The one typed error of the app. Handlers throw it; lib/api/handler.ts turns
// it into the contract's JSON error with the matching status.
export type ErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "unsupported_media_type"
  | "invalid_input"
  | "rate_limited"
  | "database_unavailable"
  | "service_unavailable"
  | "internal";

const STATUS: Record<ErrorCode, number> = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  unsupported_media_type: 415,
  invalid_input: 422,
  rate_limited: 429,
  database_unavailable: 503,
  service_unavailable: 503,
  internal: 500,
};

export type FieldErrors = Record<string, string>;

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields?: FieldErrors;
  readonly details?: Record<string, unknown>;

  constructor(code: ErrorCode, message: string, extra?: { fields?: FieldErrors; details?: Record<string, unknown> }) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fields = extra?.fields;
    this.details = extra?.details;
  }

  get status(): number {
    return STATUS[this.code];
  }
}

export const notFound = (what = "That record") => new AppError("not_found", `${what} was not found.`);
export const conflict = (message: string, details?: Record<string, unknown>) =>
  new AppError("conflict", message, { details });

const EXPECTED_WORDS: Record<string, string> = { string: "text", number: "a number", int: "a whole number", boolean: "yes or no", array: "a list", object: "a set of fields", date: "a date" };

/** Zod's own wording for a missing or mistyped field ("Invalid input: expected string, received undefined") in words a person can act on; our schemas' own messages are kept. */
function plainMessage(issue: ZodError["issues"][number]): string {
  // The unknown keys are whatever the sender made up: never echo them.
  if (issue.code === "unrecognized_keys") return "Remove the fields this form does not have.";
  if (issue.code !== "invalid_type" || !issue.message.startsWith("Invalid input")) return issue.message;
  if (/received undefined$/.test(issue.message)) return "This is needed: fill it in.";
  return `This should be ${EXPECTED_WORDS[issue.expected] ?? issue.expected}.`;
}

/** First message per field path, in the shape forms show next to each field. */
export function fieldErrorsOf(error: ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    fields[key] ??= plainMessage(issue);
  }
  return fields;
}

export function invalidInput(error: ZodError): AppError {
  return new AppError("invalid_input", "Some fields need another look.", { fields: fieldErrorsOf(error) });
}

export interface ErrorBody {
  error: { code: ErrorCode; message: string; fields?: FieldErrors } & Record<string, unknown>;
}

export function errorBody(error: AppError): ErrorBody {
  return {
    error: {
      code: error.code,
      message: error.message,
      ...(error.fields ? { fields: error.fields } : {}),
      ...(error.details ?? {}),
    },
  };
}
