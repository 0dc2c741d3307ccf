import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { publicDropPoints } from "@/lib/drives/public-service";

export const dynamic = "force-dynamic";

export const GET = route(async (_req, ctx: { params: Promise<{ slug: string }> }) => {
  const { slug } = await ctx.params;
  return NextResponse.json(await publicDropPoints(slug));
});
