import type { Metadata } from "next";
import { EmptyState } from "@/components/ui/card";
import { LogHome } from "@/components/ledger/log-home";
import { requirePageRole } from "@/lib/auth/session";
import { pageDrive } from "@/lib/drives/current-drive-queries";
import { listLogDrives } from "@/lib/drives/queries";

export const metadata: Metadata = { title: "Log" };

export default async function VolunteerHomePage({ searchParams }: { searchParams: Promise<{ dropPoint?: string }> }) {
  const actor = await requirePageRole("/log", "volunteer", "organiser");
  const { dropPoint } = await searchParams;
  const drives = await listLogDrives(actor.group.id);
  // A link from a pickup run (?dropPoint=) opens on that drop point's drive; otherwise
  // the person's remembered drive, else the one running today (never next season's).
  const linked = drives.find((d) => d.dropPoints.some((p) => p.id === dropPoint));
  const { drive: initial, today } = await pageDrive(actor, drives, linked?.id);
  return (
    <main className="mx-auto flex max-w-xl flex-col gap-5">
      <h1 className="text-3xl">Hello, {actor.user.name.split(" ")[0]}</h1>
      {initial ? (
        <LogHome drives={drives} initialDriveId={initial.id} initialDropPointId={dropPoint} today={today} />
      ) : (
        <EmptyState title="No drives yet">Your organiser sets up drives and drop points; then you can log hauls here.</EmptyState>
      )}
    </main>
  );
}
