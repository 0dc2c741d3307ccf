import { z } from "zod";
import { endpoint } from "@/lib/api/endpoint";
import { notFound } from "@/lib/api/errors";
import { UUID } from "@/lib/api/path";
import { suggestedStops } from "@/lib/runs/planner-queries";

export const dynamic = "force-dynamic";

const suggestionsQuery = z.object({ driveId: z.string().optional() });

/** The drive's drop points ranked for the next run: `?driveId=…` (a missing or malformed id names no drive: 404). */
export const GET = endpoint({ who: ["organiser"], query: suggestionsQuery }, async ({ actor, query }) => {
  if (!query.driveId || !UUID.test(query.driveId)) throw notFound("That drive");
  return suggestedStops(actor.group.id, query.driveId.toLowerCase());
});
