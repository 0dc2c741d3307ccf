import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole } from "@/lib/auth/session";
import { getHeaterUnit, moveHeaterState } from "@/lib/heaters/queries";
import { checkStateMove } from "@/lib/heaters/states";
import { heaterStateInputSchema } from "@/lib/heaters/unit-schemas";

export const dynamic = "force-dynamic";

type Context = { params: Promise<{ id: string }> };

// Moves a unit along planned → claiming → building → installed; the rule is
// in lib/heaters/states.ts and is checked under a row lock.
export const POST = route(async (request: Request, { params }: Context) => {
  const actor = await requireRole("builder", "organiser");
  const { id } = await params;
  // Another group's unit is 404 before anything about the body is said.
  await getHeaterUnit(actor.group.id, id);
  const { state } = await parseJson(request, heaterStateInputSchema);
  const unit = await moveHeaterState(actor.group.id, id, state, (from) => checkStateMove(from, state, actor.role));
  return NextResponse.json(unit);
});
