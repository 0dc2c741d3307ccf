"use client";

import { signIn } from "next-auth/react";
import { useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { ROLE_HOME, type Role } from "@/lib/auth/roles";

export function SignInForm() {
  const router = useRouter();
  const next = useSearchParams().get("next");
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setPending(true);
    setError(null);
    const result = await signIn("credentials", {
      email: String(form.get("email") ?? ""),
      password: String(form.get("password") ?? ""),
      redirect: false,
    });
    if (!result || result.error) {
      setPending(false);
      setError(
        result?.status === 429 || result?.error?.includes("wait")
          ? result.error
          : "That e-mail and password do not match an account. Check both and try again.",
      );
      return;
    }
    const me = await fetch("/api/me").then((r) => (r.ok ? r.json() : null));
    const home = me?.role ? ROLE_HOME[me.role as Role] : "/";
    router.push(next && next.startsWith("/") && !next.startsWith("//") ? next : home);
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-2" noValidate>
      <FormError message={error} />
      <Field id="email" name="email" type="email" label="E-mail" autoComplete="email" required />
      <Field id="password" name="password" type="password" label="Password" autoComplete="current-password" required />
      <Button type="submit" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
