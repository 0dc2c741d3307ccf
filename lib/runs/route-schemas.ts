/**
 * Input of `POST /api/plan/route` and of the run planner form: one schema for
 * both so the form shows exactly the messages the handler would return.
 */
import { z } from "zod";

/** Keeps one request bounded: the matrix is (n + 1)² and 2-opt is O(n²) a pass. */
export const MAX_ROUTE_STOPS = 500;

function coordinate(name: string, limit: number) {
  return z
    .number({
      error: (issue) =>
        issue.input === undefined || issue.input === null
          ? `${name} is required`
          : `${name} must be a number in degrees`,
    })
    .min(-limit, { error: `${name} must be between −${limit} and ${limit} degrees` })
    .max(limit, { error: `${name} must be between −${limit} and ${limit} degrees` });
}

const latitude = coordinate("Latitude", 90);
const longitude = coordinate("Longitude", 180);

const pointSchema = z.object(
  { lat: latitude, lng: longitude },
  { error: "A point needs a latitude and a longitude" },
);

// Ids come from the database (numbers) or from the client (strings); routes
// hand them back, so one canonical string form avoids 7 ≠ "7" surprises.
const stopIdSchema = z
  .union([z.string().trim().min(1, { error: "A stop id cannot be empty" }), z.number()], {
    error: "Each stop needs an id (text or a number)",
  })
  .transform((id) => String(id));

const stopSchema = z.object(
  { id: stopIdSchema, lat: latitude, lng: longitude },
  { error: "Each stop needs an id, a latitude and a longitude" },
);

export const routeInputSchema = z.object(
  {
    start: pointSchema,
    stops: z
      .array(stopSchema, { error: "Stops must be a list of drop points" })
      .min(1, { error: "Choose at least one stop" })
      .max(MAX_ROUTE_STOPS, { error: `A route can have at most ${MAX_ROUTE_STOPS} stops` })
      .superRefine((stops, ctx) => {
        const seen = new Set<string>();
        stops.forEach((stop, index) => {
          if (seen.has(stop.id)) {
            ctx.addIssue({
              code: "custom",
              path: [index, "id"],
              message: `Stop id "${stop.id}" appears more than once`,
            });
          }
          seen.add(stop.id);
        });
      }),
    returnToStart: z.boolean({ error: "Return to start must be true or false" }).optional().default(false),
  },
  { error: "Send a start point and a list of stops" },
);

/** What the handler receives after parsing: ids are strings, returnToStart is set. */
export type RouteInput = z.infer<typeof routeInputSchema>;
/** What a client may send. */
export type RouteInputRaw = z.input<typeof routeInputSchema>;
