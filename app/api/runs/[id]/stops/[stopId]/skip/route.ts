import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { uuidValue } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { db } from "@/lib/db";
import { getRun, resolveStop } from "@/lib/runs/queries";
import { skipStopInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

export const POST = route(async (request, ctx: { params: Promise<{ id: string; stopId: string }> }) => {
  const actor = await requireRole("organiser", "volunteer");
  const params = await ctx.params;
  const runId = uuidValue(params.id, "That pickup run");
  const stopId = uuidValue(params.stopId, "That stop");
  // Who may touch the run is checked before the body, so outsiders learn nothing from a 422.
  await getRun(actor, runId);
  const input = await parseJson(request, skipStopInputSchema);
  await db.transaction((trx) => resolveStop(actor, runId, stopId, { status: "skipped", reason: input.reason }, trx));
  return NextResponse.json(await getRun(actor, runId));
});
