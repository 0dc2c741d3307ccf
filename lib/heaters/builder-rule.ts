/**
 * Who may act on a heater unit. A builder works only on the units they build
 * (the unit's `builder_id`, set to whoever saved the plan); an organiser acts
 * on every unit of the group, and alone moves claims between units. Pure and
 * safe to import in the client, so the unit page offers exactly what the
 * server allows.
 */
import type { Role } from "@/lib/auth/roles";

export type UnitPurpose = "claim" | "release" | "builtIn" | "state" | "moveClaims";

const DOING: Record<UnitPurpose, string> = {
  claim: "claim cans for",
  release: "release cans from",
  builtIn: "record cans built into",
  state: "change the state of",
  moveClaims: "move claims away from",
};

export interface UnitActor {
  role: Role;
  userId: string;
}

export interface UnitBuilder {
  builderId: string | null;
  builderName: string | null;
}

/** Why this person may not act on the unit, or null when they may. */
export function unitRefusal(actor: UnitActor, unit: UnitBuilder, purpose: UnitPurpose): string | null {
  if (actor.role === "organiser") return null;
  if (purpose === "moveClaims") return "Only an organiser moves claimed cans between units.";
  if (actor.role !== "builder") return `Only the unit's builder or an organiser can ${DOING[purpose]} this unit.`;
  if (unit.builderId !== null && unit.builderId === actor.userId) return null;
  if (unit.builderId === null) return `This unit has no builder any more; only an organiser can ${DOING[purpose]} it.`;
  return `This unit is built by ${unit.builderName ?? "someone else"}; only they or an organiser can ${DOING[purpose]} it.`;
}

export function mayActOnUnit(actor: UnitActor, unit: UnitBuilder, purpose: UnitPurpose): boolean {
  return unitRefusal(actor, unit, purpose) === null;
}
