import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { requireUser } from "@/lib/auth/session";
import { createHeaterHandler } from "@/lib/heaters/create";
import { listHeatersWithClaims } from "@/lib/ledger/queries";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const actor = await requireUser();
  return NextResponse.json(await listHeatersWithClaims(actor.group.id));
});

// Saving a plan as a unit; the handler lives in lib/heaters/create.ts.
export const POST = createHeaterHandler;
