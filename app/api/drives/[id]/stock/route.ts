import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireUser } from "@/lib/auth/session";
import { driveStock } from "@/lib/ledger/balances";

export const dynamic = "force-dynamic";

export const GET = route(async (_req: Request, ctx: IdContext) => {
  const actor = await requireUser();
  const driveId = await uuidParam(ctx, "That drive");
  return NextResponse.json(await driveStock(actor.group.id, driveId));
});
