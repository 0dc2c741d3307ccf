import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { createPledge } from "@/lib/drives/public-actions";
import { pledgeInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// Anyone may pledge; name and e-mail are optional and never shown publicly.
export const POST = route(async (req, ctx: { params: Promise<{ slug: string }> }) => {
  const { slug } = await ctx.params;
  const input = await parseJson(req, pledgeInput);
  return NextResponse.json(await createPledge(slug, input), { status: 201 });
});
