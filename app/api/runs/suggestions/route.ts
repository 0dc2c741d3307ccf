import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { uuidValue } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { suggestedStops } from "@/lib/runs/planner-queries";

export const dynamic = "force-dynamic";

/** The drive's drop points ranked for the next run: `?driveId=…`. */
export const GET = route(async (request) => {
  const actor = await requireRole("organiser");
  const driveId = uuidValue(new URL(request.url).searchParams.get("driveId"), "That drive");
  return NextResponse.json(await suggestedStops(actor.group.id, driveId));
});
