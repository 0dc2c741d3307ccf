import { redirect } from "next/navigation";
import { AppHeader } from "@/components/layout/app-header";
import { DatabaseDown } from "@/components/system/database-down";
import { getActor } from "@/lib/auth/session";
import { isDatabaseUnreachable } from "@/lib/db";
import { groupLook } from "@/lib/format/group-look-queries";
import { LookProvider } from "@/hooks/use-look";
import { OfflineKeeper } from "@/components/offline/offline-keeper";
import { ROLE_HOME } from "@/lib/auth/roles";
import { env } from "@/lib/env";
import { markerAttributes } from "@/lib/offline/marker";

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
  const renderedAt = new Date().toISOString();
  return (
    <LookProvider look={look}>
      {/* Whose page this is and when it was made: the service worker keeps it in this person's own offline cache (app/sw.ts). */}
      <div hidden {...markerAttributes({ id: actor.user.id, group: actor.group.id, home: ROLE_HOME[actor.role], renderedAt })} />
      <OfflineKeeper personId={actor.user.id} groupId={actor.group.id} home={ROLE_HOME[actor.role]} renderedAt={renderedAt} tileUrl={env().TILE_URL}>
        <AppHeader groupName={actor.group.name} role={actor.role} userName={actor.user.name} />
        <div id="main" className="mx-auto max-w-5xl px-4 py-6">
          {children}
        </div>
      </OfflineKeeper>
    </LookProvider>
  );
}
