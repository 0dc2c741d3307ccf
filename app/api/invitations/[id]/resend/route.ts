import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { idParam } from "@/lib/api/ids";
import { requireRole } from "@/lib/auth/session";
import { resendInvitation } from "@/lib/accounts/invitations";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ id: string }> };

export const POST = route(async (_request, { params }: Ctx) => {
  const actor = await requireRole("organiser");
  return NextResponse.json(await resendInvitation(actor, idParam((await params).id, "That invitation")));
});
