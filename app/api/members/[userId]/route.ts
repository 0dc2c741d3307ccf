import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { idParam } from "@/lib/api/ids";
import { requireRole } from "@/lib/auth/session";
import { memberRoleInputSchema } from "@/lib/accounts/schemas";
import { findMember, updateMembership } from "@/lib/accounts/queries";

export const dynamic = "force-dynamic";

type Ctx = { params: Promise<{ userId: string }> };

// The member is looked up in the acting group first, so another group's
// member is a 404 whatever the body says.
export const PATCH = route(async (request, { params }: Ctx) => {
  const actor = await requireRole("organiser");
  const userId = idParam((await params).userId, "That member");
  await findMember(actor.group.id, userId);
  const { role } = await parseJson(request, memberRoleInputSchema);
  await updateMembership(actor.group.id, userId, { role });
  return NextResponse.json(await findMember(actor.group.id, userId));
});

export const DELETE = route(async (_request, { params }: Ctx) => {
  const actor = await requireRole("organiser");
  const userId = idParam((await params).userId, "That member");
  await updateMembership(actor.group.id, userId, { remove: true });
  return NextResponse.json({ removed: true });
});
