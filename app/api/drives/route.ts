import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole, requireUser } from "@/lib/auth/session";
import { createDrive } from "@/lib/drives/actions";
import { listDrives } from "@/lib/drives/queries";
import { driveInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const actor = await requireUser();
  return NextResponse.json(await listDrives(actor.group.id));
});

export const POST = route(async (req) => {
  const actor = await requireRole("organiser");
  const input = await parseJson(req, driveInput);
  return NextResponse.json(await createDrive(actor.group.id, input), { status: 201 });
});
