import "server-only";
import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole } from "@/lib/auth/session";
import { createHeaterUnit } from "./queries";
import { heaterCreateInputSchema } from "./unit-schemas";

/**
 * POST /api/heaters: saves a plan as a heater unit of one of the group's
 * drives. Lives here so the route file can also carry the list (GET) kept
 * by the ledger area without the two handlers tangling.
 */
export const createHeaterHandler = route(async (request: Request) => {
  const actor = await requireRole("builder", "organiser");
  const input = await parseJson(request, heaterCreateInputSchema);
  const unit = await createHeaterUnit({ groupId: actor.group.id, userId: actor.user.id }, input);
  return NextResponse.json(unit, { status: 201 });
});
