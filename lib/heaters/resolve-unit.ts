import "server-only";
import { AppError } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { unitRefusal, type UnitPurpose } from "./builder-rule";
import { getHeaterUnit, type HeaterUnitRow } from "./queries";

/**
 * The heater-unit resource's resolver: every route that acts on one unit
 * calls it before reading the body. The unit is loaded filtered by the acting
 * group in SQL (another group's unit, or an id that is not a UUID, is 404);
 * the group's units are visible to every member, so a builder acting on a
 * unit someone else builds is told so with a 403, never a 404. Organisers
 * keep every power (lib/heaters/builder-rule.ts).
 */
export async function resolveUnitForActor(actor: Actor, unitId: string, purpose: UnitPurpose): Promise<HeaterUnitRow> {
  const unit = await getHeaterUnit(actor.group.id, unitId);
  const refusal = unitRefusal({ role: actor.role, userId: actor.user.id }, unit, purpose);
  if (refusal) throw new AppError("forbidden", refusal);
  return unit;
}
