import { route } from "@/lib/api/handler";
import { publicDropPointsJson } from "@/lib/drives/public-service";

export const dynamic = "force-dynamic";

export const GET = route(async (_req, ctx: { params: Promise<{ slug: string }> }) => {
  const { slug } = await ctx.params;
  return new Response(await publicDropPointsJson(slug), { headers: { "content-type": "application/json" } });
});
