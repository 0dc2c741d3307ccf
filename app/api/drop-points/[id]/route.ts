import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole } from "@/lib/auth/session";
import { updateDropPoint } from "@/lib/drives/actions";
import { dropPointPatch } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// Partial update: the map's drag sends only lat and lng, the form sends all fields.
export const PATCH = route(async (req, ctx: { params: Promise<{ id: string }> }) => {
  const actor = await requireRole("organiser");
  const { id } = await ctx.params;
  const input = await parseJson(req, dropPointPatch);
  return NextResponse.json(await updateDropPoint(actor.group.id, id, input));
});
