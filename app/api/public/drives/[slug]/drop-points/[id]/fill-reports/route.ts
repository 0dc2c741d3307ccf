import { NextResponse } from "next/server";
import { notFound } from "@/lib/api/errors";
import { parseJson, route } from "@/lib/api/handler";
import { createFillReport } from "@/lib/drives/public-actions";
import { fillReportInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// Anyone standing at a drop point may say how full its bin is.
export const POST = route(async (req, ctx: { params: Promise<{ slug: string; id: string }> }) => {
  const { slug, id } = await ctx.params;
  if (!/^[0-9a-f-]{36}$/i.test(id)) throw notFound("That drop point");
  const input = await parseJson(req, fillReportInput);
  return NextResponse.json(await createFillReport(slug, id, input), { status: 201 });
});
