import "server-only";
import type { Actor } from "@/lib/auth/queries";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { groupLook } from "@/lib/format/group-look-queries";
import { sendMail } from "@/lib/mail/outbox";
import { runAssignedMail, runCancelledMail, runMovedMail, runTakenOffMail } from "./mail";
import type { RunDetail } from "./types";

// The e-mails after a run's edit or cancel, sent after commit through the
// outbox (which retries delivery), so a mail hiccup never undoes the change.

type Person = { id: string; name: string; email: string };

export async function mailRunEdit(
  actor: Actor,
  before: RunDetail,
  after: RunDetail,
  change: { dateChanged: boolean; newDriver: Person | null; oldDriver: Person | null },
) {
  const look = await groupLook(actor.group.id);
  const appUrl = env().APP_URL;
  const base = { appUrl, runId: after.id, organiserName: actor.user.name, driveName: after.driveName, look };
  const send = (to: string, mail: { subject: string; text: string }) => sendMail({ groupId: actor.group.id, to, ...mail, kind: "pickup_run" });
  if (change.newDriver) {
    await send(change.newDriver.email, runAssignedMail({
      ...base,
      assigneeName: change.newDriver.name,
      plannedOn: after.plannedOn,
      distanceKm: after.distanceKm,
      stopNames: after.stopList.filter((s) => s.status === "pending").map((s) => s.dropPoint.name),
    }));
    if (change.oldDriver && change.oldDriver.id !== change.newDriver.id) {
      await send(change.oldDriver.email, runTakenOffMail({ ...base, name: change.oldDriver.name, plannedOn: before.plannedOn }));
    }
  } else if (change.dateChanged && after.assigneeId) {
    const driver = await assigneeOf(after.assigneeId);
    if (driver) await send(driver.email, runMovedMail({ ...base, name: driver.name, from: before.plannedOn, to: after.plannedOn }));
  }
}

export async function mailRunCancelled(actor: Actor, run: RunDetail, reason: string) {
  if (!run.assigneeId || run.assigneeId === actor.user.id) return;
  const driver = await assigneeOf(run.assigneeId);
  if (!driver) return;
  const mail = runCancelledMail({
    appUrl: env().APP_URL, runId: run.id, name: driver.name, organiserName: actor.user.name, driveName: run.driveName,
    plannedOn: run.plannedOn, reason: reason.replace(/\s+/g, " "), look: await groupLook(actor.group.id),
  });
  await sendMail({ groupId: actor.group.id, to: driver.email, ...mail, kind: "pickup_run" });
}

async function assigneeOf(userId: string): Promise<Person | undefined> {
  return db("users").select("id", "name", "email").where({ id: userId }).first();
}
