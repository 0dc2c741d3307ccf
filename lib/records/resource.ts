import "server-only";
import { notFound } from "@/lib/api/errors";
import type { Resolver } from "@/lib/api/endpoint";
import { UUID } from "@/lib/api/path";
import { db } from "@/lib/db";
import { recordLabel, type RecordKind } from "./kinds";

/** Where each kind lives; photos are the upload rows of drop points and fill reports. */
const TABLE = { drive: "drives", dropPoint: "drop_points", photo: "files", pledge: "pledges", fillReport: "fill_reports" } as const;
const PHOTO_PURPOSES = ["drop-point-photo", "fill-report-photo"];

export interface OwnRecord {
  id: string;
  archivedAt: Date | null;
}

/** A record of the acting group by id, in SQL: another group's (or none) is 404 before the body is read. */
export const ownRecord =
  (kind: RecordKind): Resolver<{ id: string }, OwnRecord> =>
  async (actor, { id }) => {
    const row = UUID.test(id)
      ? await db(TABLE[kind])
          .select("id", "archived_at as archivedAt")
          .where({ id, group_id: actor.group.id })
          .modify((q) => (kind === "photo" ? q.whereIn("purpose", PHOTO_PURPOSES) : q))
          .first()
      : undefined;
    if (!row) throw notFound(recordLabel(kind));
    return row as OwnRecord;
  };
