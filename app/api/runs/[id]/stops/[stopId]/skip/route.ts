import { endpoint } from "@/lib/api/endpoint";
import { db } from "@/lib/db";
import { stopPath } from "@/lib/runs/paths";
import { resolveStop } from "@/lib/runs/commands";
import { getRun } from "@/lib/runs/queries";
import { visibleRun } from "@/lib/runs/resource";
import { skipStopInputSchema } from "@/lib/runs/schemas";
import { resolveEntryTime } from "@/lib/ledger/entry-time-query";

export const dynamic = "force-dynamic";

// Who may touch the run is resolved before the body, so outsiders learn nothing from a 422.
export const POST = endpoint(
  { who: ["organiser", "volunteer"], params: stopPath, resource: visibleRun, body: skipStopInputSchema },
  async ({ actor, params, body, resource }) => {
    // The time it was entered (an offline skip is sent later), not before the drive began nor ahead of the clock.
    const at = body.happenedAt ? await resolveEntryTime(db, { groupId: actor.group.id, driveId: resource.driveId }, { happenedAt: body.happenedAt, legacyField: "happenedAt" }) : undefined;
    await db.transaction((trx) => resolveStop(actor, params.id, params.stopId, { status: "skipped", reason: body.reason, at }, trx));
    return getRun(actor, params.id);
  },
);
