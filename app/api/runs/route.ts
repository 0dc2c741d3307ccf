import { NextResponse } from "next/server";
import { parseJson, route } from "@/lib/api/handler";
import { requireRole } from "@/lib/auth/session";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail/outbox";
import { runAssignedMail } from "@/lib/runs/mail";
import { createRun, listRuns } from "@/lib/runs/queries";
import { createRunInputSchema } from "@/lib/runs/schemas";

export const dynamic = "force-dynamic";

export const GET = route(async () => {
  const actor = await requireRole("organiser", "volunteer");
  return NextResponse.json(await listRuns(actor));
});

export const POST = route(async (request) => {
  const actor = await requireRole("organiser");
  const input = await parseJson(request, createRunInputSchema);
  const run = await createRun(actor, input);
  // After commit: the outbox retries delivery, so a mail hiccup never loses the run.
  const mail = runAssignedMail({
    appUrl: env().APP_URL,
    runId: run.id,
    assigneeName: run.assignee.name,
    organiserName: actor.user.name,
    driveName: run.drive.name,
    plannedOn: input.plannedOn,
    distanceKm: run.plan.distanceKm,
    stopNames: run.stopNames,
  });
  await sendMail({ groupId: actor.group.id, to: run.assignee.email, ...mail, kind: "pickup_run" });
  return NextResponse.json(
    { id: run.id, order: run.plan.order, distanceKm: run.plan.distanceKm, assigneeId: run.assignee.id },
    { status: 201 },
  );
});
