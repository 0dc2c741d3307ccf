import { route } from "@/lib/api/handler";
import { parseBody, withIdempotentStatement } from "@/lib/api/idempotency";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { processingInputSchema } from "@/lib/ledger/schemas";
import { ledgerRefusal, prepareProcessing } from "@/lib/ledger/record";
import { assertOwnDrive } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

export const POST = route(async (req: Request, ctx: IdContext) => {
  const actor = await requireRole("volunteer", "organiser");
  const driveId = await uuidParam(ctx, "That drive");
  // One statement writes the key, its answer and the ledger lines (see withIdempotentStatement);
  // ledger_post refuses another group's drive (404), so the hot path needs no separate check.
  return withIdempotentStatement(req, actor, async (raw) => {
    let input;
    try {
      input = parseBody(raw, processingInputSchema);
    } catch (error) {
      await assertOwnDrive(actor.group.id, driveId); // another group's drive is 404 whatever the body
      throw error;
    }
    const { answer, call } = await prepareProcessing(actor, driveId, input);
    return { status: 201, body: answer, ...call, refusal: ledgerRefusal };
  });
}, { keepsPeople: true });
