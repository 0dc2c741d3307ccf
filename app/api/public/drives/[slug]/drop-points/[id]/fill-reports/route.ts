import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { uuidValue } from "@/lib/api/params";
import { createFillReport } from "@/lib/drives/public-actions";
import { fillReportInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// Anyone standing at a drop point may say how full its bin is.
export const POST = route(async (req, ctx: { params: Promise<{ slug: string; id: string }> }) => {
  const { slug, id: raw } = await ctx.params;
  const id = uuidValue(raw, "That drop point");
  const input = await parseJson(req, fillReportInput);
  return NextResponse.json(await createFillReport(slug, id, input), { status: 201 });
});
