import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { idParam } from "@/lib/api/ids";
import { requireRole } from "@/lib/auth/session";
import { revokeInvitation } from "@/lib/accounts/invitations";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

export const DELETE = route(async (_request, { params }: Ctx) => {
  const actor = await requireRole("organiser");
  await revokeInvitation(actor.group.id, idParam((await params).id, "That invitation"));
  return NextResponse.json({ revoked: true });
});
