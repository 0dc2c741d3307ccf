import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { uuidValue } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { db } from "@/lib/db";
import { getRun } from "@/lib/runs/queries";
import { unskipStop } from "@/lib/runs/stop-follow";

export const dynamic = "force-dynamic";

// Puts a skipped stop back on the run (pending again), e.g. the bin was reachable after all.
export const POST = route(async (_request, ctx: { params: Promise<{ id: string; stopId: string }> }) => {
  const actor = await requireRole("organiser", "volunteer");
  const params = await ctx.params;
  const runId = uuidValue(params.id, "That pickup run");
  const stopId = uuidValue(params.stopId, "That stop");
  await db.transaction((trx) => unskipStop(actor, runId, stopId, trx));
  return NextResponse.json(await getRun(actor, runId));
});
