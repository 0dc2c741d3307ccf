import type { Metadata } from "next";
import Link from "next/link";
import { Card, EmptyState } from "@/components/ui/card";
import { requirePageRole } from "@/lib/auth/session";
import { listDrives } from "@/lib/drives/queries";

export const metadata: Metadata = { title: "Dashboard" };

export default async function DashboardPage() {
  const actor = await requirePageRole("/dashboard", "organiser");
  const drives = await listDrives(actor.group.id);
  return (
    <main className="flex flex-col gap-6">
      <h1 className="text-3xl">{actor.group.name}</h1>
      <Card title="Drives">
        {drives.length === 0 ? (
          <EmptyState title="No drives yet">A drive gathers cans for the heaters your group plans to build.</EmptyState>
        ) : (
          <ul className="divide-y divide-paper-edge">
            {drives.map((d) => (
              <li key={d.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
                <span>
                  <span className="text-lg font-semibold">{d.name}</span>
                  {d.isPublic ? (
                    <>
                      {" "}
                      · <Link href={`/drives/${d.slug}`}>public page</Link>
                    </>
                  ) : (
                    <span className="text-ink-faint"> · not public</span>
                  )}
                </span>
                <span className="text-ink-faint">
                  {d.dropPoints} drop points · {d.heaterUnits} heater units · {d.startsOn} to {d.endsOn}
                </span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </main>
  );
}
