import { route } from "@/lib/api/handler";
import { parseBody, withIdempotency } from "@/lib/api/idempotency";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { claimInputSchema } from "@/lib/ledger/schemas";
import { recordClaim } from "@/lib/ledger/record";
import { resolveUnitForActor } from "@/lib/heaters/resolve-unit";

export const dynamic = "force-dynamic";

export const POST = route(async (req: Request, ctx: IdContext) => {
  const actor = await requireRole("builder", "organiser");
  const heaterUnitId = await uuidParam(ctx, "That heater unit");
  await resolveUnitForActor(actor, heaterUnitId, "claim");
  return withIdempotency(req, actor, async (trx, raw) => {
    const input = parseBody(raw, claimInputSchema);
    return { status: 201, body: await recordClaim(actor, heaterUnitId, input.quantity, trx, input.note) };
  });
}, { keepsPeople: true });
