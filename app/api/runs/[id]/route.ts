import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { uuidValue } from "@/lib/api/params";
import { requireRole } from "@/lib/auth/session";
import { getRun } from "@/lib/runs/queries";

export const dynamic = "force-dynamic";

export const GET = route(async (_request, ctx: { params: Promise<{ id: string }> }) => {
  const actor = await requireRole("organiser", "volunteer");
  const id = uuidValue((await ctx.params).id, "That pickup run");
  return NextResponse.json(await getRun(actor, id));
});
