import { route } from "@/lib/api/handler";
import { parseBody, withIdempotency } from "@/lib/api/idempotency";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireUser } from "@/lib/auth/session";
import { reverseMovement } from "@/lib/ledger/record";
import { reversalInputSchema } from "@/lib/ledger/schemas";

export const dynamic = "force-dynamic";

// Any signed-in member may ask; reverseMovement allows the author or an organiser.
// The body is optional ({reason}); an empty body still undoes.
export const POST = route(async (req: Request, ctx: IdContext) => {
  const actor = await requireUser();
  const movementId = await uuidParam(ctx, "That entry");
  return withIdempotency(req, actor, async (trx, raw) => {
    const { reason } = parseBody(raw, reversalInputSchema);
    return { status: 201, body: await reverseMovement(actor, movementId, trx, reason || undefined) };
  });
}, { keepsPeople: true });
