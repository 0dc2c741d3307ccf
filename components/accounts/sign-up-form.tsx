"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { IDLE, typed, type ActionState } from "@/lib/api/action-state";
import { signUpAction } from "@/lib/accounts/form-actions";
import { ResendVerification } from "./resend-verification";
import { fieldsMessage } from "./form-message";

// A plain form posting to a server action: it works before (or without) JavaScript.
export function SignUpForm() {
  const [state, send, pending] = useActionState<ActionState<{ email: string }>, FormData>(signUpAction, IDLE);

  if (state.ok && state.data) {
    // No signing in yet: the account opens once the mailed link proves the address is theirs.
    return (
      <div className="flex flex-col gap-3">
        <Notice tone="good" title="Check your e-mail">
          We sent a link to <strong className="break-all">{state.data.email}</strong>. Open it to confirm the address, then sign in. It expires in
          48 hours; check the spam folder if it does not arrive within a few minutes.
        </Notice>
        <ResendVerification email={state.data.email} />
      </div>
    );
  }

  const f = state.fields;
  return (
    <form action={send} noValidate className="flex flex-col gap-2">
      <FormError message={fieldsMessage(state)} />
      <Field id="name" label="Your name" autoComplete="name" defaultValue={typed(state, "name")} error={f.name} />
      <Field id="email" type="email" label="E-mail" autoComplete="email" defaultValue={typed(state, "email")} error={f.email} />
      <Field id="password" type="password" label="Password" hint="At least 10 characters." autoComplete="new-password" error={f.password} />
      <Field id="groupName" label="Your group's name" hint="For example: Larkhollow Warm Rooms Circle." autoComplete="organization" defaultValue={typed(state, "groupName")} error={f.groupName} />
      <Button type="submit" disabled={pending}>
        {pending ? "Creating your group…" : "Create group"}
      </Button>
    </form>
  );
}
