import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { listMemberships } from "@/lib/auth/queries";

export const dynamic = "force-dynamic";

// The groups the signed-in person belongs to, for the group switcher.
export const GET = route(async () => {
  const actor = await requireUser();
  const groups = await listMemberships(actor.user.id);
  return NextResponse.json(groups.map((g) => ({ ...g, active: g.id === actor.group.id })));
});
