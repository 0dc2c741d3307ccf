import { z } from "zod";
import { route } from "@/lib/api/handler";
import { invalidInput, notFound } from "@/lib/api/errors";
import { parseBody, withIdempotency } from "@/lib/api/idempotency";
import { uuidValue } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { recordHaul } from "@/lib/ledger/record";
import { haulInputSchema } from "@/lib/ledger/schemas";
import { getRun, lockPendingStop, resolveStop } from "@/lib/runs/queries";

export const dynamic = "force-dynamic";

const bodySchema = z.record(z.string(), z.unknown(), { error: "Send the haul as a JSON object" });

// Logs the haul at this stop and settles the stop in one transaction: the
// ledger's own writer records the haul (same rules and estimate as
// POST /api/drives/{id}/hauls), then the stop keeps the haul's id. An
// Idempotency-Key makes a retry from a flaky phone connection harmless.
export const POST = route(async (request, ctx: { params: Promise<{ id: string; stopId: string }> }) => {
  const actor = await requireRole("organiser", "volunteer");
  const params = await ctx.params;
  const runId = uuidValue(params.id, "That pickup run");
  const stopId = uuidValue(params.stopId, "That stop");
  const before = await getRun(actor, runId);
  return withIdempotency(request, actor, async (trx, raw) => {
    const stop = before.stopList.find((s) => s.id === stopId);
    if (!stop) throw notFound("That stop");
    const parsed = haulInputSchema.safeParse({ ...parseBody(raw, bodySchema), dropPointId: stop.dropPoint.id });
    if (!parsed.success) throw invalidInput(parsed.error);
    // A stop already logged or skipped is a 409 before any haul is written.
    const locked = await lockPendingStop(actor, runId, stopId, trx);
    const haul = await recordHaul(actor, before.driveId, parsed.data, trx);
    await resolveStop(actor, runId, stopId, { status: "logged", haulId: haul.id }, trx, locked);
    return { status: 201, body: { haul, run: await getRun(actor, runId, trx) } };
  });
}, { keepsPeople: true });
