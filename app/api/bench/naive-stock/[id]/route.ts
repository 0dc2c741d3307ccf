import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { notFound } from "@/lib/api/errors";
import { uuidParam, type IdContext } from "@/lib/api/params";
import { requireUser } from "@/lib/auth/session";
import { benchRoutesEnabled, naiveStock } from "@/lib/bench/naive-stock";

export const dynamic = "force-dynamic";

// Exists only when the server was started with CANTROVE_BENCH=1 (npm run bench); 404 otherwise.
export const GET = route(async (_req: Request, ctx: IdContext) => {
  if (!benchRoutesEnabled()) throw notFound("That page");
  const actor = await requireUser();
  const driveId = await uuidParam(ctx, "That drive");
  return NextResponse.json(await naiveStock(actor.group.id, driveId));
});
