"use client";

import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "@/lib/api/client";
import { resetConfirmInputSchema } from "@/lib/accounts/schemas";
import { useFormFields } from "./use-form-fields";

export function ResetForm({ token }: { token: string }) {
  const form = useFormFields();
  const [done, setDone] = useState(false);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const data = Object.fromEntries(new FormData(event.currentTarget));
    const input = form.check(resetConfirmInputSchema, { ...data, token });
    if (!input) return;
    setPending(true);
    try {
      await fetchJson("/api/password-reset/confirm", { method: "POST", body: input });
      setDone(true);
    } catch (error) {
      form.fail(error);
    } finally {
      setPending(false);
    }
  }

  if (done) {
    return (
      <Notice tone="good" title="Your password is changed">
        <Link href="/signin">Sign in with the new password</Link>.
      </Notice>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <FormError message={form.message} />
      <Field id="password" type="password" label="New password" hint="At least 10 characters." autoComplete="new-password" error={form.fields.password ?? form.fields.token} />
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : "Save new password"}
      </Button>
    </form>
  );
}
