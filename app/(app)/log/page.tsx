import type { Metadata } from "next";
import { Card, EmptyState } from "@/components/ui/card";
import { requirePageRole } from "@/lib/auth/session";
import { listDrives } from "@/lib/drives/queries";

export const metadata: Metadata = { title: "Log" };

export default async function VolunteerHomePage() {
  const actor = await requirePageRole("/log", "volunteer", "organiser");
  const drives = await listDrives(actor.group.id);
  return (
    <main className="flex flex-col gap-6">
      <h1 className="text-3xl">Hello, {actor.user.name.split(" ")[0]}</h1>
      <Card title="Your group's drives">
        {drives.length === 0 ? (
          <EmptyState title="No drives yet">Your organiser sets up drives and drop points.</EmptyState>
        ) : (
          <ul className="divide-y divide-paper-edge">
            {drives.map((d) => (
              <li key={d.id} className="py-3">
                <span className="font-semibold">{d.name}</span>{" "}
                <span className="text-ink-faint">· {d.dropPoints} drop points</span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </main>
  );
}
