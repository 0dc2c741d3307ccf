import "server-only";
import type { Resolver } from "@/lib/api/endpoint";
import type { UnitPurpose } from "./builder-rule";
import { getHeaterUnit, type HeaterUnitRow } from "./queries";
import { resolveUnitForActor } from "./resolve-unit";

// How routes resolve the heater unit they act on: by id within the actor's group (404 otherwise).
export const ownHeaterUnit: Resolver<{ id: string }, HeaterUnitRow> = (actor, { id }) => getHeaterUnit(actor.group.id, id);

/** The unit, when the actor may act on it for this purpose: another group's is 404, another builder's 403. */
export const unitFor =
  (purpose: UnitPurpose): Resolver<{ id: string }, HeaterUnitRow> =>
  (actor, { id }) =>
    resolveUnitForActor(actor, id, purpose);
