"use client";

import { signIn } from "next-auth/react";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ResendVerification } from "@/components/accounts/resend-verification";
import { EMAIL_UNPROVEN } from "@/lib/accounts/schemas";
import { fetchJson } from "@/lib/api/client";
import { ROLE_HOME, type Role } from "@/lib/auth/roles";
import { safeRedirect } from "@/lib/auth/safe-redirect";

const NO_MATCH = "That e-mail and password do not match an account. Check both and try again.";

export function SignInForm() {
  const router = useRouter();
  const params = useSearchParams();
  const next = params.get("next");
  const [error, setError] = useState<string | null>(null);
  const [unproven, setUnproven] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setPending(true);
    setError(null);
    setUnproven(null);
    const email = String(form.get("email") ?? "");
    const result = await signIn("credentials", {
      email,
      password: String(form.get("password") ?? ""),
      redirect: false,
    });
    if (!result || result.error) {
      setPending(false);
      // "CredentialsSignin" is the generic miss; anything else is our own
      // message (sign-in paused after too many tries, address not proven yet).
      setError(result?.error && result.error !== "CredentialsSignin" ? result.error : NO_MATCH);
      if (result?.error === EMAIL_UNPROVEN) setUnproven(email);
      return;
    }
    const me = await fetchJson<{ role?: Role }>("/api/me").catch(() => null);
    const home = me?.role ? ROLE_HOME[me.role as Role] : "/";
    router.push(safeRedirect(next, home));
    router.refresh();
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-2" noValidate>
      {params.get("joined") ? (
        <Notice tone="good" title="You're in the group">
          Your account is ready. Sign in with the password you just chose.
        </Notice>
      ) : null}
      <FormError message={error} />
      {unproven ? <ResendVerification email={unproven} /> : null}
      <Field id="email" name="email" type="email" label="E-mail" autoComplete="email" required defaultValue={params.get("email") ?? undefined} />
      <Field id="password" name="password" type="password" label="Password" autoComplete="current-password" required />
      <Button type="submit" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
      <p className="mt-2 flex flex-wrap justify-between gap-2 text-sm">
        <Link href="/forgot">Forgot your password?</Link>
        <Link href="/signup">Start a new group</Link>
      </p>
    </form>
  );
}
