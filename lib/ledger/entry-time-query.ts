import type { Knex } from "knex";
import { notFound } from "@/lib/api/errors";
import { entryTime } from "./entry-time";

/**
 * The time a writer records: the request's own (`happenedAt`, or the older
 * per-kind name such as `hauledAt`), checked against the drive's start, else now.
 * Reads the drive only when a time was given, so the usual entry costs nothing more.
 */
export async function resolveEntryTime(
  conn: Knex | Knex.Transaction,
  m: { groupId: string; driveId: string },
  given: { happenedAt?: string; legacy?: string; legacyField: string },
): Promise<Date> {
  const value = given.happenedAt ?? given.legacy;
  if (!value) return new Date();
  const row = await conn("drives")
    .select("starts_on as startsOn")
    .where({ id: m.driveId, group_id: m.groupId })
    .first();
  if (!row) throw notFound("That drive");
  return entryTime(value, given.happenedAt ? "happenedAt" : given.legacyField, row.startsOn as string);
}

/** resolveEntryTime when the caller has already read the drive's start (YYYY-MM-DD) with its other rows. */
export function entryTimeOf(given: { happenedAt?: string; legacy?: string; legacyField: string }, startsOn: string): Date {
  const value = given.happenedAt ?? given.legacy;
  if (!value) return new Date();
  return entryTime(value, given.happenedAt ? "happenedAt" : given.legacyField, startsOn);
}
