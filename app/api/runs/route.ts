import { endpoint } from "@/lib/api/endpoint";
import { env } from "@/lib/env";
import { groupLook } from "@/lib/format/group-look-queries";
import { sendMail } from "@/lib/mail/outbox";
import { runAssignedMail } from "@/lib/runs/mail";
import { createRun } from "@/lib/runs/commands";
import { listRuns } from "@/lib/runs/queries";
import { createRunInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

export const GET = endpoint({ who: ["organiser", "volunteer"] }, async ({ actor }) => listRuns(actor));

export const POST = endpoint({ who: ["organiser"], body: createRunInputSchema, status: 201 }, async ({ actor, body }) => {
  const run = await createRun(actor, body);
  // After commit: the outbox retries delivery, so a mail hiccup never loses the run.
  const mail = runAssignedMail({
    appUrl: env().APP_URL,
    runId: run.id,
    assigneeName: run.assignee.name,
    organiserName: actor.user.name,
    driveName: run.drive.name,
    plannedOn: body.plannedOn,
    distanceKm: run.plan.distanceKm,
    stopNames: run.stopNames,
    look: await groupLook(actor.group.id),
  });
  await sendMail({ groupId: actor.group.id, to: run.assignee.email, ...mail, kind: "pickup_run" });
  return { id: run.id, order: run.plan.order, distanceKm: run.plan.distanceKm, assigneeId: run.assignee.id };
});
