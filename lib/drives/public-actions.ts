import "server-only";
import { AppError, notFound } from "@/lib/api/errors";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail/outbox";
import { LEVEL_LABEL, shouldAlert } from "./fill";
import { findPublicDrive, findPublicDropPoint } from "./public-queries";
import type { FillReportInput, PledgeInput } from "./schemas";
import { lastHauls } from "./tallies";

export async function createPledge(slug: string, input: PledgeInput) {
  const drive = await findPublicDrive(slug);
  if (!drive) throw notFound("That drive");
  const point = await findPublicDropPoint(drive.id, input.dropPointId);
  if (!point) throw new AppError("invalid_input", "Some fields need another look.", { fields: { dropPointId: "Choose one of this drive's open drop points." } });
  const [row] = await db("pledges")
    .insert({
      group_id: drive.groupId,
      drive_id: drive.id,
      drop_point_id: point.id,
      name: input.name || null,
      email: input.email || null,
      bags: input.bags,
      bring_on: input.bringOn,
    })
    .returning(["id"]);
  let mailed = false;
  if (input.email) {
    const link = `${env().APP_URL}/drives/${drive.slug}`;
    const text = [
      `Thank you${input.name ? `, ${input.name}` : ""}!`,
      "",
      `You plan to bring about ${input.bags} bag${input.bags === 1 ? "" : "s"} of cans to ${point.name} on ${input.bringOn} for the ${drive.name}.`,
      point.hours ? `Opening hours: ${point.hours}.` : "",
      "",
      "Wanted: standard 355 mL aluminium drink cans, undented, not crushed, rinsed.",
      "Please keep back slim, tall and steel cans.",
      "",
      `The drive's page: ${link}`,
      "",
      `— ${drive.groupName}`,
    ].filter((l, i, a) => l !== "" || a[i - 1] !== "");
    await sendMail({ groupId: drive.groupId, to: input.email, subject: `Your pledge for the ${drive.name}`, text: text.join("\n"), kind: "pledge-confirmation" });
    mailed = true;
  }
  return { id: row.id as string, mailed };
}

export async function createFillReport(slug: string, dropPointId: string, input: FillReportInput) {
  const drive = await findPublicDrive(slug);
  if (!drive) throw notFound("That drive");
  const point = await findPublicDropPoint(drive.id, dropPointId);
  if (!point) throw notFound("That drop point");
  // An organiser's "clear" ends a fill episode as a haul does, so the next full report alerts again.
  const hauledAt = (await lastHauls([point.id]))[point.id] ?? null;
  const clearedAt = point.fillClearedAt ? new Date(point.fillClearedAt) : null;
  const haulAt = !clearedAt || (hauledAt && hauledAt > clearedAt) ? hauledAt : clearedAt;
  const result = await db.transaction(async (trx) => {
    // The row lock serialises reports for one bin, so two reports at once cannot both alert.
    await trx("drop_points").where({ id: point.id }).forUpdate().first();
    const lastAlert = await trx("fill_reports").where({ drop_point_id: point.id, alerted: true }).max("created_at as at").first();
    const alert = shouldAlert(input.level, lastAlert?.at ? new Date(lastAlert.at) : null, haulAt);
    const [row] = await trx("fill_reports")
      .insert({ group_id: drive.groupId, drop_point_id: point.id, level: input.level, note: input.note, alerted: alert })
      .returning(["id"]);
    return { id: row.id as string, alerted: alert };
  });
  if (result.alerted) {
    const organisers = await db("memberships as m").join("users as u", "u.id", "m.user_id").select("u.email").where({ "m.group_id": drive.groupId, "m.role": "organiser" });
    const text = [
      `Someone at ${point.name} reports the bin is: ${LEVEL_LABEL[input.level]}.`,
      input.note ? `Their note: ${input.note}` : "",
      "",
      "Plan a haul soon. You will not get another alert for this bin until it has been hauled.",
      `${env().APP_URL}/drives/${drive.slug}`,
    ].filter(Boolean);
    for (const o of organisers) {
      await sendMail({ groupId: drive.groupId, to: o.email, subject: `Bin filling up: ${point.name}`, text: text.join("\n"), kind: "bin-full" });
    }
  }
  return result;
}
