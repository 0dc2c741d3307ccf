import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { parseBody, withIdempotency } from "@/lib/api/idempotency";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { haulInputSchema } from "@/lib/ledger/schemas";
import { recordHaul } from "@/lib/ledger/record";
import { assertOwnDrive, listHauls } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

/** The drive's hauls, newest first; `?open=1` for those not yet sorted (what a sort can count). */
export const GET = route(async (req: Request, ctx: IdContext) => {
  const actor = await requireRole("volunteer", "organiser");
  const driveId = await uuidParam(ctx, "That drive");
  const open = new URL(req.url).searchParams.get("open") === "1";
  return NextResponse.json(await listHauls(actor.group.id, driveId, { open }));
});

export const POST = route(async (req: Request, ctx: IdContext) => {
  const actor = await requireRole("volunteer", "organiser");
  const driveId = await uuidParam(ctx, "That drive");
  await assertOwnDrive(actor.group.id, driveId);
  return withIdempotency(req, actor, async (trx, raw) => {
    const input = parseBody(raw, haulInputSchema);
    return { status: 201, body: await recordHaul(actor, driveId, input, trx) };
  });
}, { keepsPeople: true });
