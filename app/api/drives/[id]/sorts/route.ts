import { route } from "@/lib/api/handler";
import { parseBody, withIdempotency } from "@/lib/api/idempotency";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { sortInputSchema } from "@/lib/ledger/schemas";
import { recordSort } from "@/lib/ledger/record";
import { assertOwnDrive } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

export const POST = route(async (req: Request, ctx: IdContext) => {
  const actor = await requireRole("volunteer", "organiser");
  const driveId = await uuidParam(ctx, "That drive");
  await assertOwnDrive(actor.group.id, driveId);
  return withIdempotency(req, actor, async (trx, raw) => {
    const input = parseBody(raw, sortInputSchema);
    return { status: 201, body: await recordSort(actor, driveId, input, trx) };
  });
}, { keepsPeople: true });
