import { route } from "@/lib/api/handler";
import { parseBody, withIdempotency } from "@/lib/api/idempotency";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { getHeaterUnit } from "@/lib/heaters/queries";
import { moveClaims } from "@/lib/heaters/move-claims";
import { claimMoveInputSchema } from "@/lib/heaters/unit-schemas";

export const dynamic = "force-dynamic";

// Organisers move claimed cans between units of a drive (a release and a claim).
export const POST = route(async (req: Request, ctx: IdContext) => {
  const actor = await requireRole("organiser");
  const fromId = await uuidParam(ctx, "That heater unit");
  await getHeaterUnit(actor.group.id, fromId);
  return withIdempotency(req, actor, async (trx, raw) => {
    const input = parseBody(raw, claimMoveInputSchema);
    return { status: 201, body: await moveClaims(actor, fromId, input.toHeaterId, input.quantity, trx) };
  });
}, { keepsPeople: true });
