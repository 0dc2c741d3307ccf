import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { clearFill } from "@/lib/drives/fill-queries";
import { ownDropPoint } from "@/lib/drives/resource";
import { fillClearInput } from "@/lib/drives/schemas";

export const dynamic = "force-dynamic";

// The organiser marks a full bin as dealt with (emptied by hand, a false report).
// The body is optional: an empty one clears up to now.
export const POST = endpoint(
  { who: ["organiser"], params: idPath("That drop point"), resource: ownDropPoint, body: fillClearInput },
  async ({ actor, params, body }) => clearFill(actor.group.id, params.id, body.asOf),
);
