import { redirect } from "next/navigation";
import { AppHeader } from "@/components/layout/app-header";
import { DatabaseDown } from "@/components/system/database-down";
import { getActor } from "@/lib/auth/session";
import { isDatabaseUnreachable } from "@/lib/db";
import { groupLook } from "@/lib/format/group-look-queries";
import { LookProvider } from "@/hooks/use-look";

export const dynamic = "force-dynamic";

// Pages below still check their own role; this layout only frames them.
export default async function AppLayout({ children }: { children: React.ReactNode }) {
  // The session lookup is the first query of every signed-in page, so it is
  // also the database check: no extra round trip per page.
  let actor: Awaited<ReturnType<typeof getActor>>;
  try {
    actor = await getActor();
  } catch (error) {
    if (isDatabaseUnreachable(error)) return <DatabaseDown />;
    throw error;
  }
  if (!actor) redirect("/signin");
  // How the group shows dates, numbers and measures, for the client components below.
  const look = await groupLook(actor.group.id);
  return (
    <LookProvider look={look}>
      <AppHeader groupName={actor.group.name} role={actor.role} userName={actor.user.name} />
      <div id="main" className="mx-auto max-w-5xl px-4 py-6">
        {children}
      </div>
    </LookProvider>
  );
}
