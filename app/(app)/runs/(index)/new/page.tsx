import type { Metadata } from "next";
import Link from "next/link";
import { EmptyState } from "@/components/ui/card";
import { RunPlanner } from "@/components/runs/run-planner";
import { requirePageRole } from "@/lib/auth/session";
import { pageDrive } from "@/lib/drives/current-drive-queries";
import { env } from "@/lib/env";
import { addDays } from "@/lib/drives/progress";
import { groupWorkshop, plannerDrives, suggestedStops } from "@/lib/runs/planner-queries";
import { listDrivers } from "@/lib/runs/queries";

export const metadata: Metadata = { title: "Plan a pickup run" };

export default async function NewRunPage({ searchParams }: { searchParams: Promise<{ drive?: string }> }) {
  const actor = await requirePageRole("/runs/new", "organiser");
  const drives = await plannerDrives(actor.group.id);
  if (drives.length === 0) {
    return (
      <main className="flex flex-col gap-4">
        <h1 className="text-3xl">Plan a pickup run</h1>
        <EmptyState title="No drives yet">A run visits the drop points of a drive. Set up a drive first.</EmptyState>
      </main>
    );
  }
  const wanted = (await searchParams).drive;
  // The address wins; else the remembered drive, else the one running today, where bins are filling now.
  // "Today" is the group's day (its time zone), so the run's default day is the group's tomorrow.
  const picked = await pageDrive(actor, drives, wanted);
  const drive = picked.drive!;
  const [suggestions, workshop, drivers] = await Promise.all([
    suggestedStops(actor.group.id, drive.id),
    groupWorkshop(actor.group.id),
    listDrivers(actor.group.id),
  ]);
  return (
    <main className="flex flex-col gap-4">
      <p><Link href="/runs" className="tap">← Pickup runs</Link></p>
      <h1 className="text-3xl">Plan a pickup run</h1>
      <RunPlanner
        drives={drives.map((d) => ({ id: d.id, name: d.name, startsOn: d.startsOn, endsOn: d.endsOn }))}
        initialDriveId={drive.id}
        today={picked.today}
        initialSuggestions={suggestions.map((s) => ({ ...s, lastHaulAt: s.lastHaulAt ? s.lastHaulAt.toISOString() : null }))}
        workshop={workshop}
        drivers={drivers}
        defaultDate={addDays(picked.today, 1)}
        tileUrl={env().TILE_URL}
        attribution={env().TILE_ATTRIBUTION}
      />
    </main>
  );
}
