/**
 * Inputs of the pickup-run endpoints and forms; safe to import in the client.
 */
import { z } from "zod";
import { day, moment } from "@/lib/dates";
import { MAX_ROUTE_STOPS } from "@/lib/runs/route-schemas";

export const RUN_STATES = ["planned", "under_way", "done", "cancelled"] as const;
export type RunState = (typeof RUN_STATES)[number];
export const RUN_STATE_LABEL: Record<RunState, string> = { planned: "Planned", under_way: "Under way", done: "Done", cancelled: "Cancelled" };
/** A run in one of these states takes no more edits (409). */
export const CLOSED_RUN_STATES: readonly RunState[] = ["done", "cancelled"];

/** `released`: the stop was still pending when its run was cancelled (kept for the record). */
export const STOP_STATUSES = ["pending", "logged", "skipped", "released"] as const;
export type StopStatus = (typeof STOP_STATUSES)[number];
export const STOP_STATUS_LABEL: Record<StopStatus, string> = { pending: "To visit", logged: "Haul logged", skipped: "Skipped", released: "Released (run cancelled)" };

const uuid = (what: string) => z.uuid({ error: `Choose ${what}` });

function degrees(name: string, limit: number) {
  return z
    .number({
      error: (issue) => (issue.input === undefined || issue.input === null ? `${name} is required` : `${name} must be a number in degrees`),
    })
    .min(-limit, { error: `${name} must be between −${limit} and ${limit}` })
    .max(limit, { error: `${name} must be between −${limit} and ${limit}` });
}

export const createRunInputSchema = z.object(
  {
    driveId: uuid("a drive"),
    plannedOn: day("Pick the day of the run"),
    start: z.object(
      { lat: degrees("Start latitude", 90), lng: degrees("Start longitude", 180) },
      { error: "Give the start point" },
    ),
    returnToStart: z.boolean().optional().default(false),
    dropPointIds: z
      .array(z.uuid({ error: "Unknown drop point" }), { error: "Choose the drop points to visit" })
      .min(1, { error: "Choose at least one drop point" })
      .max(MAX_ROUTE_STOPS, { error: `A run can have at most ${MAX_ROUTE_STOPS} stops` })
      .refine((ids) => new Set(ids).size === ids.length, { error: "A drop point is chosen twice" }),
    assigneeId: uuid("the volunteer who drives this run"),
    notes: z.string().trim().max(1000, { error: "Keep notes under 1000 characters" }).optional().default(""),
  },
  { error: "Send the run as a JSON object" },
);
export type CreateRunInput = z.infer<typeof createRunInputSchema>;
export type CreateRunInputRaw = z.input<typeof createRunInputSchema>;

export const skipStopInputSchema = z.object(
  {
    reason: z
      .string({ error: "Say why this stop was skipped" })
      .trim()
      .min(3, { error: "Say why this stop was skipped (a few words)" })
      .max(300, { error: "Keep the reason under 300 characters" }),
    /** When the stop was skipped, as the phone says (a skip entered with no signal is sent later); checked against the drive and the clock. */
    happenedAt: moment("Use a date and time like 2026-12-02T09:30:00Z.").optional(),
  },
  { error: "Send a reason" },
);
export type SkipStopInput = z.infer<typeof skipStopInputSchema>;

export const logStopInputSchema = z.object(
  { haulId: z.uuid({ error: "Log the haul first, then mark the stop" }) },
  { error: "Send the haul id" },
);
export type LogStopInput = z.infer<typeof logStopInputSchema>;

const notesSchema = z.string({ error: "Notes must be text" }).trim().max(1000, { error: "Keep notes under 1000 characters" });

/** PATCH /api/runs/{id}: the fields sent are changed, the others kept. Setting the same values again changes nothing and mails nobody. */
export const editRunInputSchema = z
  .object(
    {
      plannedOn: day("Pick the day of the run").optional(),
      assigneeId: uuid("the volunteer who drives this run").optional(),
      notes: notesSchema.optional(),
    },
    { error: "Send the changes as a JSON object" },
  )
  .strict()
  .refine((v) => v.plannedOn !== undefined || v.assigneeId !== undefined || v.notes !== undefined, {
    error: "Change the date, the volunteer or the notes",
    path: ["plannedOn"],
  });
export type EditRunInput = z.infer<typeof editRunInputSchema>;

/** PUT /api/runs/{id}/stops: the run's drop points in visiting order (adds, removes and reorders in one). */
export const setStopsInputSchema = z.object(
  {
    dropPointIds: z
      .array(z.uuid({ error: "Unknown drop point" }), { error: "List the drop points in visiting order" })
      .min(1, { error: "A run needs at least one stop (cancel the run instead)" })
      .max(MAX_ROUTE_STOPS, { error: `A run can have at most ${MAX_ROUTE_STOPS} stops` })
      .refine((ids) => new Set(ids).size === ids.length, { error: "A drop point is listed twice" }),
  },
  { error: "Send the stops as a JSON object" },
);
export type SetStopsInput = z.infer<typeof setStopsInputSchema>;

/** POST /api/runs/{id}/optimise: no fields; the stops still to visit are put in the shortest order. */
export const optimiseRunInputSchema = z.object({}, { error: "Send an empty JSON object" }).strict();

/** POST /api/runs/{id}/cancel */
export const cancelRunInputSchema = z.object(
  {
    reason: z
      .string({ error: "Say why the run is cancelled" })
      .trim()
      .min(3, { error: "Say why the run is cancelled (a few words)" })
      .max(300, { error: "Keep the reason under 300 characters" }),
  },
  { error: "Send a reason" },
);
export type CancelRunInput = z.infer<typeof cancelRunInputSchema>;
