import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { listHeatersWithClaims } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const actor = await requireUser();
  return NextResponse.json(await listHeatersWithClaims(actor.group.id));
});
