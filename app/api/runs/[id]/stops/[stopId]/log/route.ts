import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { uuidValue } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { db } from "@/lib/db";
import { getRun, resolveStop } from "@/lib/runs/queries";
import { assertHaulAtStop } from "@/lib/runs/activity-queries";
import { logStopInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

// The haul itself is written by the ledger (POST /api/drives/{id}/hauls); this
// marks the stop logged and records which haul it was, after checking the haul
// belongs to this group, drive and drop point.
export const POST = route(async (request, ctx: { params: Promise<{ id: string; stopId: string }> }) => {
  const actor = await requireRole("organiser", "volunteer");
  const params = await ctx.params;
  const runId = uuidValue(params.id, "That pickup run");
  const stopId = uuidValue(params.stopId, "That stop");
  const run = await getRun(actor, runId);
  const input = await parseJson(request, logStopInputSchema);
  const stop = run.stopList.find((s) => s.id === stopId);
  if (stop) await assertHaulAtStop(actor.group.id, run.driveId, stop.dropPoint.id, input.haulId);
  await db.transaction((trx) => resolveStop(actor, runId, stopId, { status: "logged", haulId: input.haulId }, trx));
  return NextResponse.json(await getRun(actor, runId));
});
