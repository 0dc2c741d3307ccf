"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "@/lib/api/client";
import { resetRequestInputSchema } from "@/lib/accounts/schemas";
import { useFormFields } from "./use-form-fields";

export function ForgotForm() {
  const form = useFormFields();
  const [answer, setAnswer] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const input = form.check(resetRequestInputSchema, Object.fromEntries(new FormData(event.currentTarget)));
    if (!input) return;
    setPending(true);
    try {
      const res = await fetchJson<{ message: string }>("/api/password-reset", { method: "POST", body: input });
      setAnswer(res.message);
    } catch (error) {
      form.fail(error);
    } finally {
      setPending(false);
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <FormError message={form.message} />
      {answer ? <Notice tone="good" title="Check your e-mail">{answer}</Notice> : null}
      <Field id="email" type="email" label="E-mail" autoComplete="email" error={form.fields.email} />
      <Button type="submit" disabled={pending}>
        {pending ? "Sending…" : "Send me a link"}
      </Button>
    </form>
  );
}
