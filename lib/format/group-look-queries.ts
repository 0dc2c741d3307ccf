import "server-only";
import { db } from "@/lib/db";
import { notFound } from "@/lib/api/errors";
import { cachedRead } from "@/lib/cache/read-cache";
import type { Look, Units } from "./look";
import type { LookInput } from "./schemas";

/** The group's look (time zone, locale, units); every page, mail and export of the group formats with it. */
// Read by the signed-in layout and again by most pages, mails and exports of one
// request: kept in the short read cache, which every write clears (a saved look too).
export async function groupLook(groupId: string): Promise<Look> {
  return cachedRead(`look:${groupId}`, async () => {
    const row = await db("groups").select("time_zone", "locale", "units").where({ id: groupId }).first();
    if (!row) throw notFound("That group");
    return { timeZone: row.time_zone as string, locale: row.locale as string, units: row.units as Units };
  });
}

/** The group's IANA time zone; day filters, the group's day and the CSV's local times use it. */
export async function groupTimeZone(groupId: string): Promise<string> {
  return (await groupLook(groupId)).timeZone;
}

/** The group's look when it is shown to people without an account: the group that runs the drive. */
export async function driveLook(driveId: string): Promise<Look> {
  const row = await db("drives as d").join("groups as g", "g.id", "d.group_id").select("g.id").where("d.id", driveId).first();
  if (!row) throw notFound("That drive");
  return groupLook(row.id as string);
}

export async function saveGroupLook(groupId: string, input: LookInput): Promise<Look> {
  const updated = await db("groups").where({ id: groupId }).update({ time_zone: input.timeZone, locale: input.locale, units: input.units });
  if (updated === 0) throw notFound("That group");
  return { timeZone: input.timeZone, locale: input.locale, units: input.units };
}
