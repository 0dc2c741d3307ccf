import "server-only";
import { db } from "@/lib/db";
import { notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { groupTimeZone } from "@/lib/format/group-look-queries";
import { localDay } from "@/lib/format/dates";
import { pickDrive, type DriveSpan } from "./current-drive";

// The person's remembered drive (memberships.current_drive_id), read and stored
// for the acting membership only. The pure rule lives in current-drive.ts.

/** The group's calendar day now, in its own time zone. */
export async function groupToday(groupId: string, now = new Date()): Promise<string> {
  return localDay(now, await groupTimeZone(groupId));
}

/** The remembered drive's id, or null. It is not checked here: pickDrive only takes it when it is one of the group's drives. */
export async function rememberedDriveId(actor: Actor): Promise<string | null> {
  const row = await db("memberships").select("current_drive_id").where({ user_id: actor.user.id, group_id: actor.group.id }).first();
  return (row?.current_drive_id as string | null | undefined) ?? null;
}

/** Remembers a drive of the actor's own group; another group's drive (or none) is 404 and nothing changes. */
export async function rememberDrive(actor: Actor, driveId: string): Promise<{ driveId: string }> {
  // The group filter is in the same statement: only a drive of the acting group can be stored.
  const own = db("drives").select("id").where({ id: driveId, group_id: actor.group.id });
  const updated = await db("memberships")
    .where({ user_id: actor.user.id, group_id: actor.group.id })
    .whereExists(own.clone())
    .update({ current_drive_id: driveId });
  if (updated === 0) throw notFound("That drive");
  return { driveId };
}

/**
 * The drive a page where cans are entered opens on: the one named in the address
 * (a link from elsewhere), else the person's remembered choice, else the default
 * rule. Returns the group's day too, for the "not running today" warnings.
 */
export async function pageDrive<D extends DriveSpan>(actor: Actor, drives: readonly D[], wanted?: string | null): Promise<{ drive: D | undefined; today: string }> {
  const [today, remembered] = await Promise.all([groupToday(actor.group.id), rememberedDriveId(actor)]);
  return { drive: pickDrive(drives, today, wanted, remembered), today };
}
