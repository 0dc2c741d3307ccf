import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { requireRole } from "@/lib/auth/session";
import { listMembers } from "@/lib/accounts/queries";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const actor = await requireRole("organiser");
  return NextResponse.json(await listMembers(actor.group.id));
});
