import { endpoint } from "@/lib/api/endpoint";
import { db } from "@/lib/db";
import { stopPath } from "@/lib/runs/paths";
import { getRun } from "@/lib/runs/queries";
import { visibleRun } from "@/lib/runs/resource";
import { unskipStop } from "@/lib/runs/stop-follow";

export const dynamic = "force-dynamic";

// Puts a skipped stop back on the run (pending again), e.g. the bin was reachable after all.
export const POST = endpoint(
  { who: ["organiser", "volunteer"], params: stopPath, resource: visibleRun },
  async ({ actor, params }) => {
    await db.transaction((trx) => unskipStop(actor, params.id, params.stopId, trx));
    return getRun(actor, params.id);
  },
);
