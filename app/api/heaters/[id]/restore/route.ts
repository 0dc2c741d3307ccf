import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { setUnitArchived } from "@/lib/heaters/archive-unit";
import { unitFor } from "@/lib/heaters/resource";
import { recordArchiveInput } from "@/lib/records/schemas";

export const dynamic = "force-dynamic";

// Restores an archived unit (issue 16): it counts toward its drive again; released claims stay released.
// Another group's unit is 404, another builder's 403, before the body is read.
export const POST = endpoint(
  { who: ["builder", "organiser"], params: idPath("That heater unit"), resource: unitFor("state"), body: recordArchiveInput },
  async ({ actor, params }) => setUnitArchived(actor, params.id, false),
);
