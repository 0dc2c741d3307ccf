import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { dropPointTallies } from "@/lib/ledger/balances";
import { publicDriveId } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

/** Live tallies per drop point of a public drive: counts only, no contact data. */
export const GET = route(async (_req: Request, ctx: { params: Promise<{ slug: string }> }) => {
  const { slug } = await ctx.params;
  return NextResponse.json(await dropPointTallies(await publicDriveId(slug)));
});
