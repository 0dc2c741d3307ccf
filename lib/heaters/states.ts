/**
 * The life of a heater unit: planned → claiming → building → installed.
 * The rule: builders and organisers move a unit forward, one or more steps
 * (a unit can go straight from planned to building when its cans are already
 * set aside). Only an organiser may step back, and only one step, to undo a
 * slip; an installed heater stays installed unless an organiser steps it back.
 */
import type { Role } from "@/lib/auth/roles";
import { HEATER_STATE_LABEL, HEATER_STATES, stateIndexOf as stateIndex, type HeaterState } from "./unit-schemas";

export type StateMove = { ok: true } | { ok: false; reason: string };

export function checkStateMove(from: HeaterState, to: HeaterState, role: Role): StateMove {
  if (role !== "builder" && role !== "organiser") return { ok: false, reason: "Only builders and organisers move a unit." };
  const step = stateIndex(to) - stateIndex(from);
  if (step === 0) return { ok: false, reason: `The unit is already at “${HEATER_STATE_LABEL[to]}”.` };
  if (step > 0) return { ok: true };
  if (role !== "organiser") return { ok: false, reason: "Only an organiser can move a unit back." };
  if (step < -1) return { ok: false, reason: "An organiser can move a unit back one step at a time." };
  return { ok: true };
}

/** The moves a person may offer on screen from the current state. */
export function allowedMoves(from: HeaterState, role: Role): HeaterState[] {
  return HEATER_STATES.filter((to) => checkStateMove(from, to, role).ok);
}
