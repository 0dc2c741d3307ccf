import type { Metadata } from "next";
import Link from "next/link";
import { ButtonLink } from "@/components/ui/button-link";
import { Card, EmptyState } from "@/components/ui/card";
import { PageHeading } from "@/components/ui/page-heading";
import { requirePageRole } from "@/lib/auth/session";
import { listDrives } from "@/lib/drives/queries";
import { countOf } from "@/lib/plural";
import { spanText } from "@/lib/drives/current-drive";
import { groupLook } from "@/lib/format/group-look-queries";

export const metadata: Metadata = { title: "Drives" };

export default async function OrganiseDrivesPage() {
  const actor = await requirePageRole("/organise/drives", "organiser");
  const [drives, archived, look] = await Promise.all([listDrives(actor.group.id), listDrives(actor.group.id, "archived"), groupLook(actor.group.id)]);
  return (
    <main className="flex flex-col gap-6">
      <PageHeading title="Drives">
        <ButtonLink href="/organise/drives/new">New drive</ButtonLink>
      </PageHeading>
      <Card>
        {drives.length === 0 ? (
          <EmptyState title="No drives yet">Start one with “New drive”, then place its drop points on the map.</EmptyState>
        ) : (
          <ul className="divide-y divide-paper-edge">
            {drives.map((d) => (
              <li key={d.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
                <Link href={`/organise/drives/${d.id}`} className="tap text-lg font-semibold">{d.name}</Link>
                <span className="text-ink-faint">
                  {spanText(d, look)} · {countOf(d.dropPoints, "drop point")} · {d.isPublic ? "public" : "not public"}
                </span>
              </li>
            ))}
          </ul>
        )}
      </Card>
      {archived.length ? (
        <Card title={`Archived drives (${archived.length})`}>
          <p className="mb-2 text-ink-soft">Hidden from the lists, the entry forms and the public. Open one to restore it.</p>
          <ul className="divide-y divide-paper-edge" aria-label="Archived drives">
            {archived.map((d) => (
              <li key={d.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
                <Link href={`/organise/drives/${d.id}`} className="tap font-semibold">{d.name}</Link>
                <span className="text-ink-faint">{spanText(d, look)}</span>
              </li>
            ))}
          </ul>
        </Card>
      ) : null}
    </main>
  );
}
