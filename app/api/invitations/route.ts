import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole } from "@/lib/auth/session";
import { invitationInputSchema } from "@/lib/accounts/schemas";
import { createInvitation, listPendingInvitations } from "@/lib/accounts/invitations";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const actor = await requireRole("organiser");
  return NextResponse.json(await listPendingInvitations(actor.group.id));
});

export const POST = route(async (request) => {
  const actor = await requireRole("organiser");
  const input = await parseJson(request, invitationInputSchema);
  return NextResponse.json(await createInvitation(actor, input), { status: 201 });
});
