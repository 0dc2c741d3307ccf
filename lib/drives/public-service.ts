import "server-only";
import { notFound } from "@/lib/api/errors";
import { findPublicDrive, listPublicDropPoints, unitCansOf } from "./public-queries";
import { EMPTY_TALLY, progressFor, tallies } from "./tallies";

const today = () => new Date().toISOString().slice(0, 10);

export async function publicDrive(slug: string) {
  const drive = await findPublicDrive(slug);
  if (!drive) throw notFound("That drive");
  const p = await progressFor(drive, await unitCansOf(drive.id, drive.groupId), today());
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
export type PublicDrive = Awaited<ReturnType<typeof publicDrive>>;

export async function publicDropPoints(slug: string) {
  const drive = await findPublicDrive(slug);
  if (!drive) throw notFound("That drive");
  const [points, counts] = await Promise.all([listPublicDropPoints(drive.id), tallies(drive.id)]);
  return points.map((p) => ({ ...p, tallies: counts[p.id] ?? EMPTY_TALLY }));
}
export type PublicDropPoint = Awaited<ReturnType<typeof publicDropPoints>>[number];
