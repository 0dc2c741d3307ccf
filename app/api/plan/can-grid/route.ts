import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { computeCanGrid } from "@/lib/heaters/can-grid";
import { canGridInputSchema } from "@/lib/heaters/schemas";

// Open to anyone: the planner works without an account. A pure computation,
// so an Idempotency-Key header is accepted and simply has nothing to guard.
export const POST = route(async (request) => {
  const input = await parseJson(request, canGridInputSchema);
  return NextResponse.json(computeCanGrid(input));
});
