import "server-only";
import type { Resolver } from "@/lib/api/endpoint";
import { getHeaterUnit, type HeaterUnitRow } from "./queries";

// How routes resolve the heater unit they act on: by id within the actor's group (404 otherwise).
export const ownHeaterUnit: Resolver<{ id: string }, HeaterUnitRow> = (actor, { id }) => getHeaterUnit(actor.group.id, id);
