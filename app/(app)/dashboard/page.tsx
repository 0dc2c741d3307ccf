import type { Metadata } from "next";
import Link from "next/link";
import { ButtonLink } from "@/components/ui/button-link";
import { Card, EmptyState } from "@/components/ui/card";
import { PageHeading } from "@/components/ui/page-heading";
import { DriveProgressCard } from "@/components/dashboard/drive-progress-card";
import { requirePageRole } from "@/lib/auth/session";
import { organiserDashboard } from "@/lib/drives/dashboard";
import { groupLook } from "@/lib/format/group-look-queries";

export const metadata: Metadata = { title: "Dashboard" };

export default async function DashboardPage() {
  const actor = await requirePageRole("/dashboard", "organiser");
  const [drives, look] = await Promise.all([organiserDashboard(actor.group.id), groupLook(actor.group.id)]);
  return (
    <main className="flex flex-col gap-6">
      <PageHeading title={actor.group.name}>
        <div className="flex flex-wrap gap-2">
          <ButtonLink href="/organise/drives/new">New drive</ButtonLink>
          <ButtonLink href="/runs/new" variant="secondary">
            Plan a pickup run
          </ButtonLink>
        </div>
      </PageHeading>
      {drives.length === 0 ? (
        <Card>
          <EmptyState title="No drives yet">
            A drive gathers cans for the heaters your group plans to build. <Link href="/organise/drives/new">Start one</Link>.
          </EmptyState>
        </Card>
      ) : (
        drives.map((d) => <DriveProgressCard key={d.drive.id} {...d} look={look} />)
      )}
    </main>
  );
}
