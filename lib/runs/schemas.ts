/**
 * Inputs of the pickup-run endpoints and forms; safe to import in the client.
 */
import { z } from "zod";
import { day } from "@/lib/dates";
import { MAX_ROUTE_STOPS } from "@/lib/runs/route-schemas";

export const RUN_STATES = ["planned", "under_way", "done"] as const;
export type RunState = (typeof RUN_STATES)[number];
export const RUN_STATE_LABEL: Record<RunState, string> = { planned: "Planned", under_way: "Under way", done: "Done" };

export const STOP_STATUSES = ["pending", "logged", "skipped"] as const;
export type StopStatus = (typeof STOP_STATUSES)[number];

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
  },
  { error: "Send a reason" },
);
export type SkipStopInput = z.infer<typeof skipStopInputSchema>;

export const logStopInputSchema = z.object(
  { haulId: z.uuid({ error: "Log the haul first, then mark the stop" }) },
  { error: "Send the haul id" },
);
export type LogStopInput = z.infer<typeof logStopInputSchema>;
