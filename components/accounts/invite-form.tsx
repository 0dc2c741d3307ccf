"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { ApiError } from "@/lib/api/client";
import { invitationInputSchema } from "@/lib/accounts/schemas";
import { fieldErrorsOf } from "@/lib/api/errors";
import { ROLE_LABEL, type Role } from "@/lib/auth/roles";
import { useInvite } from "@/hooks/queries/members";
import { ROLE_HELP, RoleSelect } from "./role-select";

export function InviteForm() {
  const invite = useInvite();
  const [email, setEmail] = useState("");
  const [role, setRole] = useState<Role>("volunteer");
  const [fields, setFields] = useState<Record<string, string>>({});
  const [sentTo, setSentTo] = useState<string | null>(null);

  async function onSubmit(event: React.FormEvent) {
    event.preventDefault();
    setSentTo(null);
    const parsed = invitationInputSchema.safeParse({ email, role });
    if (!parsed.success) return setFields(fieldErrorsOf(parsed.error));
    setFields({});
    try {
      await invite.mutateAsync(parsed.data);
      setSentTo(parsed.data.email);
      setEmail("");
    } catch (error) {
      if (error instanceof ApiError) setFields(error.fields);
    }
  }

  const apiError = invite.error instanceof ApiError && !Object.keys(invite.error.fields).length ? invite.error.message : null;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2" aria-label="Invite someone">
      <FormError message={apiError} />
      {sentTo ? <Notice tone="good" title={`Invitation sent to ${sentTo}`}>The link works once and expires in 7 days.</Notice> : null}
      <Field id="invite-email" name="email" type="email" label="Their e-mail" autoComplete="off" value={email} onChange={(e) => setEmail(e.target.value)} error={fields.email} />
      <RoleSelect id="invite-role" name="role" label="Role" value={role} onChange={(e) => setRole(e.target.value as Role)} error={fields.role} />
      <p className="text-sm text-ink-faint">
        {ROLE_LABEL[role]}: {ROLE_HELP[role]}.
      </p>
      <Button type="submit" disabled={invite.isPending}>
        {invite.isPending ? "Sending…" : "Send invitation"}
      </Button>
    </form>
  );
}
