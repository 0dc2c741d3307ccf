import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { setStops } from "@/lib/runs/edit";
import { getRun } from "@/lib/runs/queries";
import { visibleRun } from "@/lib/runs/resource";
import { setStopsInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

// The run's drop points in visiting order: adds, removes (pending stops only) and
// reorders by hand in one request. The same list again gives the same run (a retry is harmless).
export const PUT = endpoint(
  { who: ["organiser"], params: idPath("That pickup run"), resource: visibleRun, body: setStopsInputSchema },
  async ({ actor, resource, body }) => {
    await setStops(actor, resource, body.dropPointIds);
    return getRun(actor, resource.id);
  },
);
