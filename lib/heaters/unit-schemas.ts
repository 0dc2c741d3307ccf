/**
 * Inputs for saving a plan as a heater unit and for moving its state. Shared
 * by the planner's save form and the handlers. Safe to import in the client.
 */
import { z } from "zod";
import { canGridGivenSchema, canGridInputSchema } from "./schemas";

export const HEATER_STATES = ["planned", "claiming", "building", "installed"] as const;
export type HeaterState = (typeof HEATER_STATES)[number];

export const HEATER_STATE_LABEL: Record<HeaterState, string> = {
  planned: "Planned",
  claiming: "Gathering cans",
  building: "Being built",
  installed: "On the wall",
};

export const heaterCreateInputSchema = z.object(
  {
    name: z
      .string({ error: "Name the unit (for example, the room it will warm)" })
      .trim()
      .min(1, { error: "Name the unit (for example, the room it will warm)" })
      .max(120, { error: "Keep the name under 120 characters" }),
    driveId: z.uuid({ error: "Choose the drive this unit is counted against" }),
    notes: z.string().trim().max(2000, { error: "Keep the note under 2000 characters" }).optional(),
    plan: canGridInputSchema,
  },
  { error: "Send the unit's name, its drive and its plan" },
);
export type HeaterCreateInput = z.input<typeof heaterCreateInputSchema>;

export const heaterStateInputSchema = z.object(
  { state: z.enum(HEATER_STATES, { error: "State must be planned, claiming, building or installed" }) },
  { error: "Send the new state" },
);
export type HeaterStateInput = z.infer<typeof heaterStateInputSchema>;

export function stateIndexOf(state: HeaterState): number {
  return HEATER_STATES.indexOf(state);
}

/** An organiser moves claimed cans from one unit to another of the same drive. */
export const claimMoveInputSchema = z.object(
  {
    toHeaterId: z.uuid({ error: "Choose the unit that takes the cans" }),
    quantity: z
      .number({ error: "Enter the number of cans" })
      .int({ error: "Whole cans only" })
      .min(1, { error: "Move at least 1 can" })
      .max(1_000_000, { error: "That is more cans than one move holds" }),
  },
  { error: "Send the unit that takes the cans and how many" },
);
export type ClaimMoveInput = z.infer<typeof claimMoveInputSchema>;

// Archiving or restoring a unit, and GET /api/heaters?archived=1, take the inputs every record
// does (lib/records/schemas.ts: recordArchiveInput, shelfQuery).

/**
 * POST /api/heaters/{id}/glazing: the unit's new plan (issue 16); its cans are recomputed from it on the
 * server. What the plan leaves out keeps the unit's own saved value (changeGlazing), never a default.
 */
export const heaterGlazingInputSchema = z.object({ plan: canGridGivenSchema }, { error: "Send the unit's new plan" }).strict();
export type HeaterGlazingInput = z.input<typeof heaterGlazingInputSchema>;
