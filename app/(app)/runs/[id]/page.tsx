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
import { getRun } from "@/lib/runs/queries";

export const metadata: Metadata = { title: "Pickup run" };

export default async function RunPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageRole(`/runs/${id}`, "organiser", "volunteer");
  if (!UUID.test(id)) notFound();
  const run = await getRun(actor, id).catch((error) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  return (
    <main className="flex flex-col gap-4">
      <p><Link href="/runs" className="tap">← Pickup runs</Link></p>
      <Prefetched data={[[runKeys.detail(run.id), run]]}>
        <RunView
          runId={run.id}
          canAct={actor.role === "organiser" || run.assigneeId === actor.user.id}
          tileUrl={env().TILE_URL}
          attribution={env().TILE_ATTRIBUTION}
        />
      </Prefetched>
    </main>
  );
}
