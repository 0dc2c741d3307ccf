"use client";

import { useSession } from "next-auth/react";
import { SessionBoundary } from "@/components/auth/session-boundary";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormError } from "@/components/ui/field";
import { fetchJson } from "@/lib/api/client";
import { acceptInvitationInputSchema, passwordSchema, personNameSchema } from "@/lib/accounts/schemas";
import { ROLE_HOME, type Role } from "@/lib/auth/roles";
import { useFormFields } from "./use-form-fields";

interface Accepted {
  group: { id: string };
  role: Role;
  email: string;
}

const newPersonSchema = acceptInvitationInputSchema.extend({ name: personNameSchema, password: passwordSchema });

/** A new person: choose a name and password, then sign in. */
export function AcceptAsNewPerson({ token, email }: { token: string; email: string }) {
  const router = useRouter();
  const form = useFormFields();
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const data = Object.fromEntries(new FormData(event.currentTarget));
    const input = form.check(newPersonSchema, { ...data, token });
    if (!input) return;
    setPending(true);
    try {
      await fetchJson<Accepted>("/api/invitations/accept", { method: "POST", body: input });
      router.push(`/signin?joined=1&email=${encodeURIComponent(email)}`);
    } catch (error) {
      form.fail(error);
      setPending(false);
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-2">
      <FormError message={form.message} />
      <Field id="invite-account-email" label="E-mail" value={email} readOnly hint="The address the invitation was sent to." />
      <Field id="name" label="Your name" autoComplete="name" error={form.fields.name} />
      <Field id="password" type="password" label="Choose a password" hint="At least 10 characters." autoComplete="new-password" error={form.fields.password} />
      <Button type="submit" disabled={pending}>
        {pending ? "Joining…" : "Join the group"}
      </Button>
    </form>
  );
}

/** Someone already signed in as the invited address: one click adds the group and switches to it. */
export function AcceptAsMember(props: { token: string; groupName: string }) {
  return (
    <SessionBoundary>
      <AcceptAsMemberForm {...props} />
    </SessionBoundary>
  );
}

function AcceptAsMemberForm({ token, groupName }: { token: string; groupName: string }) {
  const router = useRouter();
  const { update } = useSession();
  const form = useFormFields();
  const [pending, setPending] = useState(false);

  async function accept() {
    setPending(true);
    try {
      const result = await fetchJson<Accepted>("/api/invitations/accept", { method: "POST", body: { token } });
      await update({ groupId: result.group.id });
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
