import type { Metadata } from "next";
import Link from "next/link";
import { AcceptAsMember, AcceptAsNewPerson } from "@/components/accounts/accept-invitation";
import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { findInvitationByToken } from "@/lib/accounts/invitations";
import { tokenSchema } from "@/lib/accounts/schemas";
import { getSessionUserId } from "@/lib/auth/session";
import { ROLE_LABEL } from "@/lib/auth/roles";
import { findUserEmail } from "@/lib/accounts/queries";

export const metadata: Metadata = { title: "Invitation", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = tokenSchema.safeParse(token).success ? await findInvitationByToken(token) : null;
  return (
    <main id="main" className="mx-auto max-w-md px-4 py-10">
      <h1 className="text-3xl">{invitation ? `Join ${invitation.groupName}` : "Invitation"}</h1>
      <div className="mt-6">{invitation ? <Body token={token} invitation={invitation} /> : <Gone />}</div>
    </main>
  );
}

function Gone() {
  return (
    <Notice tone="caution" title="This invitation link does not work any more">
      It may have been used already, withdrawn, or replaced by a newer e-mail. Ask the organiser who invited you to send it again.
    </Notice>
  );
}

async function Body({ token, invitation }: { token: string; invitation: NonNullable<Awaited<ReturnType<typeof findInvitationByToken>>> }) {
  const role = ROLE_LABEL[invitation.role].toLowerCase();
  if (invitation.expired) {
    return (
      <Notice tone="caution" title="This invitation has expired">
        Invitations last 7 days. Ask the organiser of {invitation.groupName} to resend it.
      </Notice>
    );
  }
  const intro = (
    <p className="mb-4 text-ink-soft">
      You are invited as a <strong>{role}</strong>, using <strong className="break-all">{invitation.email}</strong>.
    </p>
  );
  if (!invitation.hasAccount) {
    return (
      <Card>
        {intro}
        <AcceptAsNewPerson token={token} email={invitation.email} />
      </Card>
    );
  }
  const userId = await getSessionUserId();
  const signedInEmail = userId ? await findUserEmail(userId) : null;
  const next = `/invite/${token}`;
  if (!signedInEmail) {
    return (
      <Card>
        {intro}
        <p className="mb-4">You already have a Cantrove account. Sign in with it to add this group.</p>
        <Link className="font-semibold" href={`/signin?next=${encodeURIComponent(next)}&email=${encodeURIComponent(invitation.email)}`}>
          Sign in as {invitation.email}
        </Link>
        <p className="mt-2 text-sm text-ink-soft">
          Never signed in, or forgot the password? <Link href="/forgot">Set a new one by e-mail</Link>, then come back to this link.
        </p>
      </Card>
    );
  }
  if (signedInEmail.toLowerCase() !== invitation.email.toLowerCase()) {
    return (
      <Notice tone="caution" title={`You are signed in as ${signedInEmail}`}>
        This invitation is for {invitation.email}. Sign out, then open the link again and sign in with that address.
      </Notice>
    );
  }
  return (
    <Card>
      {intro}
      <AcceptAsMember token={token} groupName={invitation.groupName} />
    </Card>
  );
}
