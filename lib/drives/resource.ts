import "server-only";
import { notFound } from "@/lib/api/errors";
import type { Resolver } from "@/lib/api/endpoint";
import { publicDriveId } from "@/lib/drives/public-queries";
import { findDrive, findDropPoint, type DriveRecord, type DropPointRecord } from "./queries";

// How routes resolve the drives and drop points they act on (endpoint's `resource`):
// by id within the actor's group, in SQL, so another group's record is a 404.

export const ownDrive: Resolver<{ id: string }, DriveRecord> = async (actor, { id }) => {
  const drive = await findDrive(actor.group.id, id);
  if (!drive) throw notFound("That drive");
  return drive;
};

export const ownDropPoint: Resolver<{ id: string }, DropPointRecord> = async (actor, { id }) => {
  const point = await findDropPoint(actor.group.id, id);
  if (!point) throw notFound("That drop point");
  return point;
};

/** A public drive by its slug, for anyone: private or unknown drives are 404. */
export const publicDrive: Resolver<{ slug: string }, { id: string }> = async (_actor, { slug }) => ({ id: await publicDriveId(slug) });
