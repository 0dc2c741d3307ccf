import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { parseBody } from "@/lib/api/idempotency";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { assertOwnDropPoint, clearFill } from "@/lib/drives/fill-queries";
import { fillClearInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// The organiser marks a full bin as dealt with (emptied by hand, a false report).
export const POST = route(async (req: Request, ctx: IdContext) => {
  const actor = await requireRole("organiser");
  const dropPointId = await uuidParam(ctx, "That drop point");
  await assertOwnDropPoint(actor.group.id, dropPointId);
  // The body is optional: an empty one clears up to now.
  const input = parseBody(await req.text(), fillClearInput);
  return NextResponse.json(await clearFill(actor.group.id, dropPointId, input.asOf));
});
