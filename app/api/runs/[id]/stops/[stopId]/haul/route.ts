import { z } from "zod";
import { endpoint } from "@/lib/api/endpoint";
import { invalidInput, notFound } from "@/lib/api/errors";
import { recordHaul } from "@/lib/ledger/record";
import { haulInputSchema } from "@/lib/ledger/schemas";
import { stopPath } from "@/lib/runs/paths";
import { lockPendingStop, resolveStop } from "@/lib/runs/commands";
import { getRun } from "@/lib/runs/queries";
import { visibleRun } from "@/lib/runs/resource";

export const dynamic = "force-dynamic";

const bodySchema = z.record(z.string(), z.unknown(), { error: "Send the haul as a JSON object" });

// Logs the haul at this stop and settles the stop in one transaction: the
// ledger's own writer records the haul (same rules and estimate as
// POST /api/drives/{id}/hauls), then the stop keeps the haul's id. An
// Idempotency-Key makes a retry from a flaky phone connection harmless.
export const POST = endpoint.idempotent(
  { who: ["organiser", "volunteer"], params: stopPath, resource: visibleRun, body: bodySchema, keepsPeople: true },
  async ({ actor, params, resource: before, body, trx }) => {
    const stop = before.stopList.find((s) => s.id === params.stopId);
    if (!stop) throw notFound("That stop");
    const parsed = haulInputSchema.safeParse({ ...body, dropPointId: stop.dropPoint.id });
    if (!parsed.success) throw invalidInput(parsed.error);
    // A stop already logged or skipped is a 409 before any haul is written.
    const locked = await lockPendingStop(actor, params.id, params.stopId, trx);
    const haul = await recordHaul(actor, before.driveId, parsed.data, trx);
    await resolveStop(actor, params.id, params.stopId, { status: "logged", haulId: haul.id }, trx, locked);
    return { haul, run: await getRun(actor, params.id, trx) };
  },
);
