import { endpoint } from "@/lib/api/endpoint";
import { createHeaterUnit } from "@/lib/heaters/queries";
import { heaterCreateInputSchema } from "@/lib/heaters/unit-schemas";
import { shelfQuery } from "@/lib/records/schemas";
import { listHeatersWithClaims } from "@/lib/heaters/queries";

export const dynamic = "force-dynamic";

// Archived units are left out; `?archived=1` lists only them (issue 16).
export const GET = endpoint({ who: "member", query: shelfQuery }, async ({ actor, query }) => listHeatersWithClaims(actor.group.id, query));

// Saving a plan as a unit of one of the group's drives (createHeaterUnit checks the drive is the group's).
export const POST = endpoint({ who: ["builder", "organiser"], body: heaterCreateInputSchema, status: 201 }, async ({ actor, body }) =>
  createHeaterUnit({ groupId: actor.group.id, userId: actor.user.id }, body),
);
