import "server-only";
import { groupTimeZone } from "@/lib/format/group-look-queries";
import type { Tables } from "knex/types/tables";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { LEDGER_COUNT_CAP, type LedgerListQuery, type LedgerPage, type LedgerRow } from "./ledger-row";

// The organiser's ledger: newest first by when it happened, then by line, so
// an entry logged late still sits at its real place. Paged by a cursor (the
// last line shown: keyset paging on (group_id, drive_id, occurred_at desc,
// id desc) or (group_id, occurred_at desc, id desc)), so "Load more" neither
// skips nor repeats a line while others keep logging, and a page costs the
// same at the end of a million lines as at their start. The first page also
// counts the matching lines, but only up to LEDGER_COUNT_CAP: an exact count
// read every line of a busy drive on every view.

type Filter = LedgerListQuery & { personId?: string };


function filtered(groupId: string, f: Filter, timeZone: string): Knex.QueryBuilder {
  return db("ledger_lines as l")
    .where("l.group_id", groupId)
    .modify((q) => {
      if (f.driveId) q.andWhere("l.drive_id", f.driveId);
      if (f.dropPointId) q.andWhere("l.drop_point_id", f.dropPointId);
      if (f.stage) q.andWhere((w) => w.where("l.from_stage", f.stage!).orWhere("l.to_stage", f.stage!));
      if (f.personId) q.andWhere("l.recorded_by", f.personId);
      // Days are the group's days: "to 30 Nov" ends at local midnight, not UTC's.
      if (f.from) q.andWhere("l.occurred_at", ">=", db.raw("(?::date)::timestamp at time zone ?", [f.from, timeZone]));
      if (f.to) q.andWhere("l.occurred_at", "<", db.raw("(?::date + 1)::timestamp at time zone ?", [f.to, timeZone]));
    });
}

/**
 * How many lines match, up to `cap` + 1 and no further: the inner LIMIT stops
 * the index scan there, so a busy drive costs what a small one does. A filter the
 * index does not hold (a person, a stage, a drop point) that matches few of a big
 * drive's lines still walks the drive's index until it has found cap + 1 or run out,
 * as the page itself does until it has found its 51.
 */
async function boundedCount(groupId: string, f: Filter, zone: string, cap: number): Promise<number> {
  const inner = filtered(groupId, f, zone).select(db.raw("1")).limit(cap + 1);
  const [row] = await db.from(inner.as("matching")).count<{ n: number }[]>({ n: "*" });
  return row?.n ?? 0;
}

/**
 * A page of the ledger after `f.cursor` (or the first). `count: false` (the
 * CSV) skips the count; it is done on the first page only in any case.
 */
export async function listLedgerPage(groupId: string, f: Filter, pageSize: number, timeZone?: string, o: { count?: boolean } = {}): Promise<LedgerPage> {
  const zone = timeZone ?? (await groupTimeZone(groupId));
  const limit = Math.min(f.limit ?? pageSize, 100_000);
  const counting = o.count !== false && !f.cursor;
  const [rows, count] = await Promise.all([
    filtered(groupId, f, zone)
      .join("movements as m", "m.id", "l.movement_id")
      .join("users as u", "u.id", "l.recorded_by")
      .join("drives as d", "d.id", "l.drive_id")
      .leftJoin("drop_points as p", "p.id", "l.drop_point_id")
      .leftJoin("heater_units as h", "h.id", "l.heater_unit_id")
      // The undo of this line's movement, and within it the line that undoes this one.
      .leftJoin("movements as rm", "rm.reverses_movement_id", "l.movement_id")
      .leftJoin("ledger_lines as rl", function () {
        this.on("rl.movement_id", "=", "rm.id").andOn("rl.reverses_id", "=", "l.id");
      })
      .select(
        "l.id", "l.movement_id", "m.kind", "l.occurred_at", "l.recorded_at", "u.name as person", "u.id as person_id", "d.name as drive", "d.id as drive_id",
        "p.name as drop_point", "h.name as heater_unit", "l.from_stage", "l.to_stage", "l.quantity", "l.reason", "l.is_estimate", "l.reverses_id", "l.note",
        "rl.id as reversed_by_id", db.raw(`case when m.kind = 'reversal' then m.details->>'reason' end as reversal_reason`),
      )
      .modify((q) => {
        if (f.cursor) {
          q.andWhere(db.raw("(l.occurred_at, l.id) < (select c.occurred_at, c.id from ledger_lines c where c.id = ? and c.group_id = ?)", [f.cursor, groupId]));
        }
      })
      .orderBy([{ column: "l.occurred_at", order: "desc" }, { column: "l.id", order: "desc" }])
      .limit(limit + 1),
    counting ? boundedCount(groupId, f, zone, LEDGER_COUNT_CAP) : null,
  ]);
  const lines: ListedLine[] = rows; // a join: the row type is said here
  const more = lines.length > limit;
  const page = (more ? lines.slice(0, limit) : lines).map(toRow);
  const over = count !== null && count > LEDGER_COUNT_CAP;
  return { rows: page, total: count === null ? null : Math.min(count, LEDGER_COUNT_CAP), totalOver: over, nextCursor: more ? page[page.length - 1].id : null };
}

type Line = Tables["ledger_lines"];
type ListedLine = Pick<Line, "id" | "movement_id" | "occurred_at" | "recorded_at" | "from_stage" | "to_stage" | "quantity" | "reason" | "is_estimate" | "reverses_id" | "note"> & {
  kind: string;
  person: string;
  person_id: string;
  drive: string;
  drive_id: string;
  drop_point: string | null;
  heater_unit: string | null;
  reversed_by_id: number | null;
  reversal_reason: string | null;
};

function toRow(r: ListedLine): LedgerRow {
  return {
    id: String(r.id),
    movementId: r.movement_id,
    kind: r.kind,
    occurredAt: r.occurred_at.toISOString(),
    recordedAt: r.recorded_at.toISOString(),
    person: r.person,
    personId: r.person_id,
    drive: r.drive,
    driveId: r.drive_id,
    dropPoint: r.drop_point,
    heaterUnit: r.heater_unit,
    from: r.from_stage,
    to: r.to_stage,
    quantity: r.quantity,
    reason: r.reason,
    isEstimate: r.is_estimate,
    reversesId: r.reverses_id === null ? null : String(r.reverses_id),
    note: r.note,
    reversedById: r.reversed_by_id === null ? null : String(r.reversed_by_id),
    reversalReason: r.reversal_reason ?? null,
  };
}

/** The drive's slug and dates, for the export's file name; null for another group's drive (its rows are filtered out anyway). */
export async function exportDrive(groupId: string, driveId: string | undefined) {
  if (!driveId) return null;
  const d = await db("drives").select("slug", "starts_on as startsOn", "ends_on as endsOn").where({ id: driveId, group_id: groupId }).first();
  return (d ?? null) as { slug: string; startsOn: string; endsOn: string } | null;
}
