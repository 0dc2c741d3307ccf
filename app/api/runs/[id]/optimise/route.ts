import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { optimiseRun } from "@/lib/runs/edit";
import { getRun } from "@/lib/runs/queries";
import { visibleRun } from "@/lib/runs/resource";
import { optimiseRunInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

// The stops still to visit in the route planner's shortest order (lib/runs/route-order.ts);
// stops already settled keep their place. An Idempotency-Key keeps the first answer (endpoint()).
export const POST = endpoint(
  { who: ["organiser"], params: idPath("That pickup run"), resource: visibleRun, body: optimiseRunInputSchema },
  async ({ actor, resource }) => {
    await optimiseRun(actor, resource);
    return getRun(actor, resource.id);
  },
);
