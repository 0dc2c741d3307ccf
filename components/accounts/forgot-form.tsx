"use client";

import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { IDLE, typed, type ActionState } from "@/lib/api/action-state";
import { resetRequestAction } from "@/lib/accounts/form-actions";
import { fieldsMessage } from "./form-message";

export function ForgotForm() {
  const [state, send, pending] = useActionState<ActionState<{ message: string }>, FormData>(resetRequestAction, IDLE);
  return (
    <form action={send} noValidate className="flex flex-col gap-2">
      <FormError message={fieldsMessage(state)} />
      {state.ok && state.data ? <Notice tone="good" title="Check your e-mail">{state.data.message}</Notice> : null}
      <Field id="email" type="email" label="E-mail" autoComplete="email" defaultValue={typed(state, "email")} error={state.fields.email} />
      <Button type="submit" disabled={pending}>
        {pending ? "Sending…" : "Send me a link"}
      </Button>
    </form>
  );
}
