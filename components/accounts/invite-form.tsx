"use client";

import { useActionState, useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { IDLE, typed, type ActionState } from "@/lib/api/action-state";
import { inviteAction } from "@/lib/accounts/form-actions";
import { ROLE_LABEL, type Role } from "@/lib/auth/roles";
import { useInvitationSent } from "@/hooks/queries/members";
import { fieldsMessage } from "./form-message";
import { ROLE_HELP, RoleSelect } from "./role-select";

export function InviteForm() {
  const [state, send, pending] = useActionState<ActionState<{ email: string }>, FormData>(inviteAction, IDLE);
  const [role, setRole] = useState<Role>("volunteer");
  const invitationSent = useInvitationSent();
  // The pending list below is a react-query read: refresh it after each invitation sent.
  useEffect(() => {
    if (state.ok) void invitationSent();
  }, [state, invitationSent]);

  return (
    <form action={send} noValidate className="flex flex-col gap-2" aria-label="Invite someone">
      <FormError message={fieldsMessage(state)} />
      {state.ok && state.data ? <Notice tone="good" title={`Invitation sent to ${state.data.email}`}>The link works once and expires in 7 days.</Notice> : null}
      <Field id="invite-email" name="email" type="email" label="Their e-mail" autoComplete="off" defaultValue={typed(state, "email")} error={state.fields.email} />
      <RoleSelect id="invite-role" name="role" label="Role" value={role} onChange={(e) => setRole(e.target.value as Role)} error={state.fields.role} />
      <p className="text-sm text-ink-faint">
        {ROLE_LABEL[role]}: {ROLE_HELP[role]}.
      </p>
      <Button type="submit" disabled={pending}>
        {pending ? "Sending…" : "Send invitation"}
      </Button>
    </form>
  );
}
