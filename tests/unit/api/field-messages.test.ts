import { describe, expect, it } from "vitest";
import { z } from "zod";
import { fieldErrorsOf } from "@/lib/api/errors";

// What a person sees next to a field when the request left it out or sent the
// wrong kind of value: zod's developer wording is replaced, our own kept.
const schema = z.object({
  name: z.string().min(1, "Give the drive a name."),
  slug: z.string(),
  bags: z.number(),
  isPublic: z.boolean(),
});

function errorsFor(input: unknown) {
  const result = schema.safeParse(input);
  if (result.success) throw new Error("expected a refusal");
  return fieldErrorsOf(result.error);
}

describe("field messages", () => {
  it("says a missing field is needed, in words", () => {
    expect(errorsFor({ name: "Spring", bags: 1, isPublic: true }).slug).toBe("This is needed: fill it in.");
  });

  it("says what kind of value a mistyped field wants", () => {
    const fields = errorsFor({ name: "Spring", slug: "s", bags: "three", isPublic: "yes" });
    expect(fields.bags).toBe("This should be a number.");
    expect(fields.isPublic).toBe("This should be yes or no.");
  });

  it("keeps the schema's own message", () => {
    expect(errorsFor({ name: "", slug: "s", bags: 1, isPublic: true }).name).toBe("Give the drive a name.");
  });
});

describe("made-up keys", () => {
  it("are never echoed back in a field message", () => {
    const strict = z.object({ name: z.string() }).strict();
    const result = strict.safeParse({ name: "Spring", "$$; select pg_sleep(5); $$": "x" });
    if (result.success) throw new Error("expected a refusal");
    expect(JSON.stringify(fieldErrorsOf(result.error))).not.toContain("pg_sleep");
  });
});
