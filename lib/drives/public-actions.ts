import "server-only";
import { AppError, notFound } from "@/lib/api/errors";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail/outbox";
import { LEVEL_LABEL, shouldAlert } from "./fill";
import { findPublicDrive, findPublicDropPoint } from "./public-queries";
import type { FillReportInput, PledgeInput } from "./schemas";
import { groupLook } from "@/lib/format/group-look-queries";
import { newCancelToken } from "./pledge-life";
import { binFullAlert, confirmationAddressKey, pledgeConfirmation } from "./public-mail";
import { lastHauls } from "./tallies";

/**
 * True for the first pledge of the day (UTC) naming this address on this
 * drive: the primary key decides, so concurrent pledges cannot both win.
 */
async function claimConfirmation(groupId: string, driveId: string, email: string): Promise<boolean> {
  const today = db.raw("(now() at time zone 'UTC')::date");
  const claimed = await db("pledge_confirmations")
    .insert({ group_id: groupId, drive_id: driveId, address_hash: confirmationAddressKey(email), day: today })
    .onConflict(["drive_id", "address_hash", "day"])
    .ignore()
    .returning("day");
  // Yesterday's claims decide nothing any more; the key's drive prefix keeps this cheap.
  if (claimed.length) await db("pledge_confirmations").where({ drive_id: driveId }).andWhere("day", "<", db.raw("(now() at time zone 'UTC')::date - 1")).del();
  return claimed.length > 0;
}

export async function createPledge(slug: string, input: PledgeInput) {
  const drive = await findPublicDrive(slug);
  if (!drive) throw notFound("That drive");
  const point = await findPublicDropPoint(drive.id, input.dropPointId);
  if (!point) throw new AppError("invalid_input", "Some fields need another look.", { fields: { dropPointId: "Choose one of this drive's open drop points." } });
  const cancel = newCancelToken();
  const [row] = await db("pledges")
    .insert({
      cancel_token_hash: cancel.hash,
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
  if (input.email && (await claimConfirmation(drive.groupId, drive.id, input.email))) {
    const mail = pledgeConfirmation({
      driveName: drive.name,
      groupName: drive.groupName,
      pointName: point.name,
      pointHours: point.hours ?? null,
      bags: input.bags,
      bringOn: input.bringOn,
      donorName: input.name,
      driveUrl: `${env().APP_URL}/drives/${drive.slug}`,
      cancelUrl: `${env().APP_URL}/pledges/cancel/${cancel.token}`,
      look: await groupLook(drive.groupId),
    });
    await sendMail({ groupId: drive.groupId, to: input.email, ...mail, kind: "pledge-confirmation" });
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
    const lastAlert = await trx("fill_reports").where({ drop_point_id: point.id, alerted: true }).max<{ at: Date | null }[]>("created_at as at").first();
    const alert = shouldAlert(input.level, lastAlert?.at ?? null, haulAt);
    const [row] = await trx("fill_reports")
      .insert({ group_id: drive.groupId, drop_point_id: point.id, level: input.level, note: input.note, alerted: alert })
      .returning(["id"]);
    return { id: row.id as string, alerted: alert };
  });
  if (result.alerted) {
    const organisers = await db("memberships as m").join("users as u", "u.id", "m.user_id").select("u.email").where({ "m.group_id": drive.groupId, "m.role": "organiser" });
    const mail = binFullAlert({ pointName: point.name, levelLabel: LEVEL_LABEL[input.level], note: input.note, driveUrl: `${env().APP_URL}/drives/${drive.slug}` });
    for (const o of organisers) {
      await sendMail({ groupId: drive.groupId, to: o.email, ...mail, kind: "bin-full" });
    }
  }
  return result;
}
