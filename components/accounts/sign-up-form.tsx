"use client";

import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { fetchJson } from "@/lib/api/client";
import { signUpInputSchema } from "@/lib/accounts/schemas";
import { useFormFields } from "./use-form-fields";

export function SignUpForm() {
  const router = useRouter();
  const form = useFormFields();
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const data = Object.fromEntries(new FormData(event.currentTarget));
    const input = form.check(signUpInputSchema, data);
    if (!input) return;
    setPending(true);
    try {
      await fetchJson("/api/signup", { method: "POST", body: input });
      const result = await signIn("credentials", { email: input.email, password: input.password, redirect: false });
      router.push(result?.ok ? "/dashboard" : "/signin");
      router.refresh();
    } catch (error) {
      form.fail(error);
      setPending(false);
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <FormError message={form.message} />
      <Field id="name" label="Your name" autoComplete="name" error={form.fields.name} />
      <Field id="email" type="email" label="E-mail" autoComplete="email" error={form.fields.email} />
      <Field id="password" type="password" label="Password" hint="At least 10 characters." autoComplete="new-password" error={form.fields.password} />
      <Field id="groupName" label="Your group's name" hint="For example: Larkhollow Warm Rooms Circle." autoComplete="organization" error={form.fields.groupName} />
      <Button type="submit" disabled={pending}>
        {pending ? "Creating your group…" : "Create group and sign in"}
      </Button>
    </form>
  );
}
