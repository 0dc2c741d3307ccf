import "server-only";
import type { Tables } from "knex/types/tables";
import { db } from "@/lib/db";
import { notFound } from "@/lib/api/errors";
import type { MyEntry, OpenHaul } from "./types";

type HaulListRow = Pick<
  Tables["hauls"],
  "id" | "movement_id" | "drop_point_id" | "bags" | "weight_kg" | "estimated_cans" | "estimate_method" | "estimate_counted_hauls" | "hauled_at" | "sort_id"
> & { drop_point_name: string };

export async function listHauls(groupId: string, driveId: string, opts: { open?: boolean } = {}): Promise<OpenHaul[]> {
  const drive = await db("drives").select("id").where({ id: driveId, group_id: groupId }).first();
  if (!drive) throw notFound("That drive");
  // A join: the row type is said here (the columns of "hauls" as types/tables/*.d.ts has them).
  const rows: HaulListRow[] = await db("hauls as h")
    .join("drop_points as p", "p.id", "h.drop_point_id")
    .select("h.id", "h.movement_id", "h.drop_point_id", "p.name as drop_point_name", "h.bags", "h.weight_kg", "h.estimated_cans", "h.estimate_method", "h.estimate_counted_hauls", "h.hauled_at", "h.sort_id")
    .where({ "h.group_id": groupId, "h.drive_id": driveId })
    .whereNull("h.reversed_at")
    .modify((q) => {
      if (opts.open) q.whereNull("h.sort_id");
    })
    .orderBy("h.hauled_at", "desc")
    .limit(200);
  return rows.map((r) => ({
    id: r.id,
    movementId: r.movement_id,
    dropPointId: r.drop_point_id,
    dropPointName: r.drop_point_name,
    bags: r.bags,
    weightKg: r.weight_kg,
    estimatedCans: r.estimated_cans,
    estimate: { method: r.estimate_method, countedHauls: r.estimate_counted_hauls },
    hauledAt: r.hauled_at.toISOString(),
    sorted: r.sort_id !== null,
  }));
}

export type { LedgerRow } from "./ledger-row";

/** A person's own recent entries, each with whether it was undone (for the volunteer's "undo"). */
export async function listMyEntries(groupId: string, userId: string, limit = 15): Promise<MyEntry[]> {
  const rows = await db("movements as m")
    .leftJoin("movements as r", "r.reverses_movement_id", "m.id")
    .join("drives as d", "d.id", "m.drive_id")
    .select("m.id", "m.kind", "m.occurred_at", "m.details", "d.name as drive", "r.id as reversed_by")
    .select(db.raw(`(select coalesce(sum(quantity), 0)::int from ledger_lines l where l.movement_id = m.id and l.to_stage is not null and l.is_estimate = false) as counted`))
    .select(db.raw(`(select coalesce(sum(quantity), 0)::int from ledger_lines l where l.movement_id = m.id and l.to_stage = 'hauled') as estimated`))
    .select(db.raw(`(select string_agg(distinct p.name, ', ') from hauls h join drop_points p on p.id = h.drop_point_id where h.movement_id = m.id) as drop_point`))
    .where({ "m.group_id": groupId, "m.recorded_by": userId })
    .whereNot("m.kind", "reversal")
    .orderBy("m.recorded_at", "desc")
    .limit(limit);
  return rows.map((r) => ({
    movementId: r.id as string,
    kind: r.kind as string,
    occurredAt: new Date(r.occurred_at).toISOString(),
    drive: r.drive as string,
    dropPoint: (r.drop_point as string | null) ?? null,
    details: r.details as Record<string, unknown>,
    counted: r.counted as number,
    estimated: r.estimated as number,
    undone: r.reversed_by !== null,
  }));
}

/** What the organiser's charts need about one drive: its start, spare and the cans of its units. */
export async function driveChartBasics(groupId: string, driveId: string) {
  const drive = await db("drives").select("id", "name", "starts_on as startsOn", "ends_on as endsOn", "spare_percent").where({ id: driveId, group_id: groupId }).first();
  if (!drive) throw notFound("That drive");
  const units = await db("heater_units").select("cans").where({ drive_id: driveId, group_id: groupId }).whereNull("archived_at").orderBy("created_at");
  return { name: drive.name, startsOn: drive.startsOn, endsOn: drive.endsOn, sparePercent: drive.spare_percent, unitCans: units.map((u) => u.cans) };
}
