"use client";

import { updateSession } from "@/components/auth/session-client";
import { useRouter } from "next/navigation";
import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { fetchJson } from "@/lib/api/client";
import { acceptInvitationAction } from "@/lib/accounts/form-actions";
import { IDLE, typed, type ActionState } from "@/lib/api/action-state";
import { fieldsMessage } from "./form-message";
import { ROLE_HOME, type Role } from "@/lib/auth/roles";
import { useFormFields } from "./use-form-fields";

interface Accepted {
  group: { id: string };
  role: Role;
  email: string;
}

/** A new person: choose a name and password, then sign in. A plain form posting to a server action, so it works before JavaScript. */
export function AcceptAsNewPerson({ token, email }: { token: string; email: string }) {
  const [state, send, pending] = useActionState<ActionState<unknown>, FormData>(acceptInvitationAction, IDLE);
  return (
    <form action={send} noValidate className="flex flex-col gap-2">
      <input type="hidden" name="token" value={token} />
      <FormError message={fieldsMessage(state) ?? state.fields.token ?? null} />
      <Field id="invite-account-email" name="" label="E-mail" value={email} readOnly hint="The address the invitation was sent to." />
      <Field id="name" label="Your name" autoComplete="name" defaultValue={typed(state, "name")} error={state.fields.name} />
      <Field id="password" type="password" label="Choose a password" hint="At least 10 characters." autoComplete="new-password" error={state.fields.password} />
      <Button type="submit" disabled={pending}>
        {pending ? "Joining…" : "Join the group"}
      </Button>
    </form>
  );
}

/** Someone already signed in as the invited address: one click adds the group and switches to it. */
export function AcceptAsMember({ token, groupName }: { token: string; groupName: string }) {
  const router = useRouter();
  const form = useFormFields();
  const [pending, setPending] = useState(false);

  async function accept() {
    setPending(true);
    try {
      const result = await fetchJson<Accepted>("/api/invitations/accept", { method: "POST", body: { token } });
      await updateSession({ groupId: result.group.id });
      router.push(ROLE_HOME[result.role]);
      router.refresh();
    } catch (error) {
      form.fail(error);
      setPending(false);
    }
  }

  return (
    <div className="flex flex-col gap-2">
      <FormError message={form.message} />
      <Button onClick={accept} disabled={pending}>
        {pending ? "Joining…" : `Join ${groupName}`}
      </Button>
    </div>
  );
}
