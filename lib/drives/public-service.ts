import { cachedRead } from "@/lib/cache/read-cache";
import "server-only";
import { notFound } from "@/lib/api/errors";
import { findPublicDrive, listPublicDropPointsWithTallies, unitCansOf } from "./public-queries";
import { progressFor } from "./tallies";
import type { PublicDriveView, PublicDropPointView } from "./types";
import type { Look } from "@/lib/format/look";

import { localDay } from "@/lib/format/dates";

// The drive's group's day, not UTC's: the pace and "ended" follow the group's calendar.
const today = (timeZone: string) => localDay(new Date(), timeZone);

export async function publicDrive(slug: string): Promise<PublicDriveView> {
  const drive = await findPublicDrive(slug);
  if (!drive) throw notFound("That drive");
  const p = await progressFor(drive, await unitCansOf(drive.id, drive.groupId, "public"), today(drive.look.timeZone));
  return {
    drive: {
      slug: drive.slug,
      name: drive.name,
      startsOn: drive.startsOn,
      endsOn: drive.endsOn,
      description: drive.description,
      wanted: drive.wanted,
      groupName: drive.groupName,
    },
    target: { cans: p.target.cans, heaters: p.target.heaters },
    progress: {
      goodCans: p.goodCans,
      estimatedUnsorted: p.estimatedUnsorted,
      yield: p.yield,
      remaining: p.remaining,
      heatersCovered: p.heatersCovered.covered,
    },
  };
}

export async function publicDropPoints(slug: string): Promise<PublicDropPointView[]> {
  const points = await cachedRead(`public-drop-points:${slug}`, () => listPublicDropPointsWithTallies(slug));
  // No rows: either a drive with no active drop point, or no such public drive.
  if (points.length === 0 && !(await findPublicDrive(slug))) throw notFound("That drive");
  return points;
}

/** The look of the group running a public drive: its page's dates and measures are written the group's way. */
export async function publicDriveLook(slug: string): Promise<Look> {
  const drive = await findPublicDrive(slug);
  if (!drive) throw notFound("That drive");
  return drive.look;
}
