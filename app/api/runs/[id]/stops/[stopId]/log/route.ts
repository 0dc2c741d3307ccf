import { endpoint } from "@/lib/api/endpoint";
import { db } from "@/lib/db";
import { stopPath } from "@/lib/runs/paths";
import { resolveStop } from "@/lib/runs/commands";
import { getRun } from "@/lib/runs/queries";
import { visibleRun } from "@/lib/runs/resource";
import { assertHaulAtStop } from "@/lib/runs/activity-queries";
import { logStopInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

// The haul itself is written by the ledger (POST /api/drives/{id}/hauls); this
// marks the stop logged and records which haul it was, after checking the haul
// belongs to this group, drive and drop point.
export const POST = endpoint(
  { who: ["organiser", "volunteer"], params: stopPath, resource: visibleRun, body: logStopInputSchema },
  async ({ actor, params, resource: run, body }) => {
    const stop = run.stopList.find((s) => s.id === params.stopId);
    if (stop) await assertHaulAtStop(actor.group.id, run.driveId, stop.dropPoint.id, body.haulId);
    await db.transaction((trx) => resolveStop(actor, params.id, params.stopId, { status: "logged", haulId: body.haulId }, trx));
    return getRun(actor, params.id);
  },
);
