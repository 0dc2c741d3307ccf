import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/ui/card";
import { InviteForm } from "@/components/accounts/invite-form";
import { InvitationList } from "@/components/accounts/invitation-list";
import { MemberList } from "@/components/accounts/member-list";
import { HandOver } from "@/components/accounts/hand-over";
import { requirePageRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Members" };

// No loading.tsx here on purpose: the role check must answer before any
// streaming starts, so a volunteer gets a real redirect, not a shell first.
// The lists below show their own skeletons while they load.
export default async function MembersPage() {
  const actor = await requirePageRole("/members", "organiser");
  return (
    <main className="flex flex-col gap-6">
      <h1 className="text-3xl">People in {actor.group.name}</h1>
      <p className="text-ink-soft">
        The group&rsquo;s time zone, date style and units: <Link href="/organise/group">group settings</Link>.
      </p>
      <div className="grid gap-6 md:grid-cols-[1fr_1.4fr]">
        <Card title="Invite someone">
          <InviteForm />
        </Card>
        <Card title="Open invitations">
          <InvitationList />
        </Card>
      </div>
      <Card title="Members">
        <p className="mb-3 text-sm text-ink-faint">A group always keeps at least one organiser.</p>
        <MemberList currentUserId={actor.user.id} />
      </Card>
      <div id="hand-over">
        <Card title="Hand the group over">
          <p className="mb-3 text-sm text-ink-faint">
            Make another member the organiser, then stay in another role or leave. To leave while others organise too, use{" "}
            <Link href="/account">My settings</Link>.
          </p>
          <HandOver currentUserId={actor.user.id} />
        </Card>
      </div>
    </main>
  );
}
