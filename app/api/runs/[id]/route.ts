import { endpoint } from "@/lib/api/endpoint";
import { idPath } from "@/lib/api/path";
import { editRun } from "@/lib/runs/edit";
import { mailRunEdit } from "@/lib/runs/edit-mail";
import { getRun } from "@/lib/runs/queries";
import { visibleRun } from "@/lib/runs/resource";
import { editRunInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: ["organiser", "volunteer"], params: idPath("That pickup run"), resource: visibleRun }, async ({ resource }) => resource);

// Date, volunteer, notes. Sending the same values again changes nothing and mails nobody,
// so a retried PATCH is harmless. Closed runs (done, cancelled) are 409.
export const PATCH = endpoint(
  { who: ["organiser"], params: idPath("That pickup run"), resource: visibleRun, body: editRunInputSchema },
  async ({ actor, resource: before, body }) => {
    const change = await editRun(actor, before, body);
    const after = await getRun(actor, before.id);
    if (change.changed) await mailRunEdit(actor, before, after, change);
    return after;
  },
);
