"use client";

import Link from "next/link";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { IDLE, type ActionState } from "@/lib/api/action-state";
import { resetConfirmAction } from "@/lib/accounts/form-actions";
import { fieldsMessage } from "./form-message";

export function ResetForm({ token }: { token: string }) {
  const [state, send, pending] = useActionState<ActionState<{ changed: boolean }>, FormData>(resetConfirmAction, IDLE);
  if (state.ok) {
    return (
      <Notice tone="good" title="Your password is changed">
        <Link href="/signin">Sign in with the new password</Link>.
      </Notice>
    );
  }
  return (
    <form action={send} noValidate className="flex flex-col gap-2">
      <input type="hidden" name="token" value={token} />
      <FormError message={fieldsMessage(state)} />
      <Field id="password" type="password" label="New password" hint="At least 10 characters." autoComplete="new-password" error={state.fields.password ?? state.fields.token} />
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : "Save new password"}
      </Button>
    </form>
  );
}
