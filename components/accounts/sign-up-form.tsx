"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { fetchJson } from "@/lib/api/client";
import { signUpInputSchema } from "@/lib/accounts/schemas";
import { ResendVerification } from "./resend-verification";
import { useFormFields } from "./use-form-fields";

export function SignUpForm() {
  const form = useFormFields();
  const [pending, setPending] = useState(false);
  const [sentTo, setSentTo] = useState<string | null>(null);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const data = Object.fromEntries(new FormData(event.currentTarget));
    const input = form.check(signUpInputSchema, data);
    if (!input) return;
    setPending(true);
    try {
      await fetchJson("/api/signup", { method: "POST", body: input });
      // No signing in yet: the account opens once the mailed link proves the address is theirs.
      setSentTo(input.email);
    } catch (error) {
      form.fail(error);
    } finally {
      setPending(false);
    }
  }

  if (sentTo) {
    return (
      <div className="flex flex-col gap-3">
        <Notice tone="good" title="Check your e-mail">
          We sent a link to <strong className="break-all">{sentTo}</strong>. Open it to confirm the address, then sign in. It expires in
          48 hours; check the spam folder if it does not arrive within a few minutes.
        </Notice>
        <ResendVerification email={sentTo} />
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <FormError message={form.message} />
      <Field id="name" label="Your name" autoComplete="name" error={form.fields.name} />
      <Field id="email" type="email" label="E-mail" autoComplete="email" error={form.fields.email} />
      <Field id="password" type="password" label="Password" hint="At least 10 characters." autoComplete="new-password" error={form.fields.password} />
      <Field id="groupName" label="Your group's name" hint="For example: Larkhollow Warm Rooms Circle." autoComplete="organization" error={form.fields.groupName} />
      <Button type="submit" disabled={pending}>
        {pending ? "Creating your group…" : "Create group"}
      </Button>
    </form>
  );
}
