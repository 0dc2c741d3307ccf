import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { cancelRun } from "@/lib/runs/edit";
import { mailRunCancelled } from "@/lib/runs/edit-mail";
import { getRun } from "@/lib/runs/queries";
import { visibleRun } from "@/lib/runs/resource";
import { cancelRunInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

// The run stays, cancelled, with its history: pending stops are released, logged hauls
// and their ledger lines stay as they are. A second cancel is 409; an Idempotency-Key
// makes a retry return the first answer (endpoint()).
export const POST = endpoint(
  { who: ["organiser"], params: idPath("That pickup run"), resource: visibleRun, body: cancelRunInputSchema },
  async ({ actor, resource, body }) => {
    await cancelRun(actor, resource, body);
    await mailRunCancelled(actor, resource, body.reason);
    return getRun(actor, resource.id);
  },
);
