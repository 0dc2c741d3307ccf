import { NextResponse } from "next/server";
import { notFound } from "@/lib/api/errors";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole } from "@/lib/auth/session";
import { createDropPoint } from "@/lib/drives/actions";
import { findDrive, listDropPoints } from "@/lib/drives/queries";
import { dropPointInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

// Includes the host's contact details, so organisers only.
export const GET = route(async (_req, ctx: Ctx) => {
  const actor = await requireRole("organiser");
  const drive = await findDrive(actor.group.id, (await ctx.params).id);
  if (!drive) throw notFound("That drive");
  return NextResponse.json(await listDropPoints(actor.group.id, drive.id));
});

export const POST = route(async (req, ctx: Ctx) => {
  const actor = await requireRole("organiser");
  const { id } = await ctx.params;
  const input = await parseJson(req, dropPointInput);
  return NextResponse.json(await createDropPoint(actor.group.id, id, input), { status: 201 });
});
