"use client";

import { useState } from "react";
import type { ZodType } from "zod";
import { ApiError } from "@/lib/api/client";
import { fieldErrorsOf } from "@/lib/api/errors";

/**
 * Field errors for a form: checked with the same schema the handler uses, then
 * the server's 422 fields merged in. Inputs are never cleared on an error.
 */
export function useFormFields() {
  const [fields, setFields] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  return {
    fields,
    message,
    check<T>(schema: ZodType<T>, value: unknown): T | null {
      const parsed = schema.safeParse(value);
      setMessage(null);
      if (!parsed.success) {
        setFields(fieldErrorsOf(parsed.error));
        return null;
      }
      setFields({});
      return parsed.data;
    },
    fail(error: unknown) {
      if (error instanceof ApiError) {
        setFields(error.fields);
        setMessage(Object.keys(error.fields).length ? null : error.message);
      } else setMessage("Something went wrong. Try again.");
    },
  };
}
