import { SignedInShell } from "@/components/layout/signed-in-shell-on-demand";
import { PublicFooter, PublicHeader } from "@/components/layout/public-header";
import { getActor } from "@/lib/auth/session";
import { isDatabaseUnreachable } from "@/lib/db";

export const dynamic = "force-dynamic";

// The planner works for anyone; a signed-in person keeps the group's
// navigation here (as on every signed-in page), a visitor gets the public
// header. With the database unreachable it still opens, as a visitor's page.
export default async function PlannerLayout({ children }: { children: React.ReactNode }) {
  let actor: Awaited<ReturnType<typeof getActor>> = null;
  try {
    actor = await getActor();
  } catch (error) {
    if (!isDatabaseUnreachable(error)) throw error;
  }
  if (!actor) {
    return (
      <>
        <PublicHeader />
        {children}
        <PublicFooter />
      </>
    );
  }
  return (
    <SignedInShell groupName={actor.group.name} role={actor.role} userName={actor.user.name}>
      {children}
    </SignedInShell>
  );
}
