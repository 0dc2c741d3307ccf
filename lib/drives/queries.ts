import "server-only";
import { db } from "@/lib/db";
import { UUID } from "@/lib/api/path";
import { onShelf, type Shelf } from "@/lib/records/shelf";
import type { DriveFillReport, DrivePledge, DropPointRecord, LogDrive, PledgeHaulChoice } from "./types";

export type { DropPointRecord };

export async function listDrives(groupId: string, shelf: Shelf = "active") {
  return db("drives as d")
    .select(
      "d.id",
      "d.slug",
      "d.name",
      "d.starts_on as startsOn",
      "d.ends_on as endsOn",
      "d.is_public as isPublic",
      db.raw(`(select count(*)::int from drop_points p where p.drive_id = d.id and p.group_id = d.group_id and p.archived_at is null) as "dropPoints"`),
      db.raw(`(select count(*)::int from heater_units h where h.drive_id = d.id and h.group_id = d.group_id and h.archived_at is null) as "heaterUnits"`),
    )
    .where("d.group_id", groupId)
    .where(onShelf(shelf, "d.archived_at"))
    .orderBy([{ column: "d.starts_on", order: "desc" }, { column: "d.name" }]);
}

export interface DriveRecord {
  id: string;
  slug: string;
  name: string;
  startsOn: string;
  endsOn: string;
  isPublic: boolean;
  description: string;
  wanted: string;
  /** ISO time it was archived (issue 16), or null. */
  archivedAt: string | null;
}

export async function findDrive(groupId: string, id: string): Promise<DriveRecord | undefined> {
  if (!UUID.test(id)) return undefined;
  return db("drives")
    .select(
      "id",
      "slug",
      "name",
      "description",
      "wanted",
      "is_public as isPublic",
      "starts_on as startsOn",
      "ends_on as endsOn",
      db.raw(`to_json(archived_at) #>> '{}' as "archivedAt"`),
    )
    .where({ id, group_id: groupId })
    .first();
}

const dropPointColumns = [
  "id",
  "drive_id as driveId",
  "name",
  "address",
  "lat",
  "lng",
  "hours",
  db.raw(`coalesce(host_name, '') as "hostName"`),
  db.raw(`coalesce(host_phone, '') as "hostPhone"`),
  db.raw(`coalesce(host_email::text, '') as "hostEmail"`),
  "capacity_bags as capacityBags",
  "opening_hours as openingHours",
  "active",
  db.raw(`to_json(archived_at) #>> '{}' as "archivedAt"`),
];

export async function listDropPoints(groupId: string, driveId: string, shelf: Shelf = "active"): Promise<DropPointRecord[]> {
  return db("drop_points").select<DropPointRecord[]>(dropPointColumns).where({ group_id: groupId, drive_id: driveId }).where(onShelf(shelf)).orderBy("name");
}

export async function findDropPoint(groupId: string, id: string): Promise<DropPointRecord | undefined> {
  if (!UUID.test(id)) return undefined;
  return db("drop_points").select<DropPointRecord[]>(dropPointColumns).where({ group_id: groupId, id }).first();
}

export async function listDropPointPhotos(groupId: string, dropPointId: string, shelf: Shelf = "active") {
  return db("files")
    .select("id", "url", "name", "size")
    .where({ group_id: groupId, purpose: "drop-point-photo", subject_id: dropPointId })
    .where(onShelf(shelf))
    .orderBy("created_at");
}

export async function listPledges(groupId: string, driveId: string, shelf: Shelf = "active"): Promise<DrivePledge[]> {
  return db("pledges as pl")
    .join("drop_points as p", "p.id", "pl.drop_point_id")
    .select(
      "pl.id",
      "pl.name",
      db.raw(`pl.email::text as email`),
      "pl.bags",
      "pl.bring_on as bringOn",
      "p.name as dropPointName",
      "pl.drop_point_id as dropPointId",
      "pl.status",
      "pl.haul_id as haulId",
      "pl.created_at as createdAt",
    )
    .where({ "pl.group_id": groupId, "pl.drive_id": driveId })
    .where(onShelf(shelf, "pl.archived_at"))
    .orderBy([{ column: "pl.bring_on" }, { column: "pl.created_at" }]);
}

/** The drive's hauls still standing (not undone), newest first: what an organiser may name as having brought a pledge. */
export async function listPledgeHauls(groupId: string, driveId: string, limit = 300): Promise<PledgeHaulChoice[]> {
  return db("hauls")
    .select("id", "drop_point_id as dropPointId", "hauled_at as hauledAt", "bags")
    .where({ group_id: groupId, drive_id: driveId })
    .whereNull("reversed_at")
    .orderBy([{ column: "hauled_at", order: "desc" }, { column: "id" }])
    .limit(limit);
}

export async function listFillReports(groupId: string, driveId: string, limit = 30, shelf: Shelf = "active"): Promise<DriveFillReport[]> {
  return db("fill_reports as f")
    .join("drop_points as p", "p.id", "f.drop_point_id")
    .leftJoin("files as fi", function () {
      // An archived photo is not offered with its report; the drive's Archived card lists it instead.
      this.on("fi.id", "=", "f.photo_file_id").andOn("fi.group_id", "=", "f.group_id").andOnNull("fi.archived_at");
    })
    .select("f.id", "f.level", "f.note", "f.alerted", "f.created_at as createdAt", "p.name as dropPointName", "fi.url as photoUrl")
    .where({ "f.group_id": groupId, "p.drive_id": driveId })
    .where(onShelf(shelf, "f.archived_at"))
    .orderBy("f.created_at", "desc")
    .limit(limit);
}

/** Drives with their dates and active drop points, for the entry forms; latest end first (pages choose with pageDrive). */
export async function listLogDrives(groupId: string): Promise<LogDrive[]> {
  const drives = await db("drives")
    .select("id", "name", "starts_on as startsOn", "ends_on as endsOn")
    .where({ group_id: groupId })
    .whereNull("archived_at")
    .orderBy([{ column: "ends_on", order: "desc" }, { column: "name" }]);
  const points = await db("drop_points").select("id", "name", "drive_id").where({ group_id: groupId, active: true }).whereNull("archived_at").orderBy("name");
  return drives.map((d) => ({
    id: d.id as string,
    name: d.name as string,
    startsOn: d.startsOn as string,
    endsOn: d.endsOn as string,
    dropPoints: points.filter((p) => p.drive_id === d.id).map((p) => ({ id: p.id as string, name: p.name as string })),
  }));
}
