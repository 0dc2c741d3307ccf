import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole } from "@/lib/auth/session";
import { moveUnitState } from "@/lib/heaters/move-state";
import { resolveUnitForActor } from "@/lib/heaters/resolve-unit";
import { heaterStateInputSchema } from "@/lib/heaters/unit-schemas";

export const dynamic = "force-dynamic";

type Context = { params: Promise<{ id: string }> };

// Moves a unit along planned → claiming → building → installed; the rule is
// in lib/heaters/states.ts and is checked under a row lock. Installing gives
// the unit's unbuilt claims back to the drive (`released` in the answer).
export const POST = route(async (request: Request, { params }: Context) => {
  const actor = await requireRole("builder", "organiser");
  const { id } = await params;
  // Another group's unit is 404, another builder's 403, before anything about the body is said.
  await resolveUnitForActor(actor, id, "state");
  const { state } = await parseJson(request, heaterStateInputSchema);
  return NextResponse.json(await moveUnitState(actor, id, state));
});
