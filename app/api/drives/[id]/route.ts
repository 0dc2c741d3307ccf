import { NextResponse } from "next/server";
import { notFound } from "@/lib/api/errors";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole, requireUser } from "@/lib/auth/session";
import { updateDrive } from "@/lib/drives/actions";
import { findDrive } from "@/lib/drives/queries";
import { driveInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

export const GET = route(async (_req, ctx: Ctx) => {
  const actor = await requireUser();
  const drive = await findDrive(actor.group.id, (await ctx.params).id);
  if (!drive) throw notFound("That drive");
  return NextResponse.json(drive);
});

export const PUT = route(async (req, ctx: Ctx) => {
  const actor = await requireRole("organiser");
  const { id } = await ctx.params;
  const input = await parseJson(req, driveInput);
  return NextResponse.json(await updateDrive(actor.group.id, id, input));
});
