import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Prefetched } from "@/components/query/prefetched";
import { RunView } from "@/components/runs/run-view";
import { runKeys } from "@/hooks/queries/keys";
import { AppError } from "@/lib/api/errors";
import { UUID } from "@/lib/api/path";
import { requirePageRole } from "@/lib/auth/session";
import { env } from "@/lib/env";
import { getRun, listDrivers } from "@/lib/runs/queries";
import { listDropPoints } from "@/lib/drives/queries";

export const metadata: Metadata = { title: "Pickup run" };

export default async function RunPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageRole(`/runs/${id}`, "organiser", "volunteer");
  if (!UUID.test(id)) notFound();
  const run = await getRun(actor, id).catch((error) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const organiser = actor.role === "organiser";
  const [drivers, points] = organiser ? await Promise.all([listDrivers(actor.group.id), listDropPoints(actor.group.id, run.driveId)]) : [[], []];
  return (
    <main className="flex flex-col gap-4">
      <p><Link href="/runs" className="tap">← Pickup runs</Link></p>
      <Prefetched data={[[runKeys.detail(run.id), run]]}>
        <RunView
          runId={run.id}
          canAct={actor.role === "organiser" || run.assigneeId === actor.user.id}
          canEdit={organiser}
          drivers={drivers.map((d) => ({ id: d.id as string, name: d.name as string, role: d.role as string }))}
          dropPoints={points.map((p) => ({ id: p.id, name: p.active ? p.name : `${p.name} (paused)` }))}
          tileUrl={env().TILE_URL}
          attribution={env().TILE_ATTRIBUTION}
        />
      </Prefetched>
    </main>
  );
}
