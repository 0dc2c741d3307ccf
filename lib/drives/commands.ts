import "server-only";
import { AppError, notFound } from "@/lib/api/errors";
import { db } from "@/lib/db";
import { UUID } from "@/lib/api/path";
import { findDrive, findDropPoint } from "./queries";
import type { DriveInput, DropPointInput } from "./schemas";

const slugTaken = () =>
  new AppError("invalid_input", "Some fields need another look.", { fields: { slug: "That web address is already taken; choose another." } });

function driveRow(input: Partial<DriveInput>) {
  const row: Record<string, unknown> = {};
  if (input.name !== undefined) row.name = input.name;
  if (input.slug !== undefined) row.slug = input.slug;
  if (input.startsOn !== undefined) row.starts_on = input.startsOn;
  if (input.endsOn !== undefined) row.ends_on = input.endsOn;
  if (input.isPublic !== undefined) row.is_public = input.isPublic;
  if (input.description !== undefined) row.description = input.description;
  if (input.wanted !== undefined) row.wanted = input.wanted;
  return row;
}

async function ensureSlugFree(slug: string, exceptId?: string) {
  const clash = await db("drives").select("id").where({ slug }).modify((q) => (exceptId ? q.whereNot({ id: exceptId }) : q)).first();
  if (clash) throw slugTaken();
}

function rethrowUnique(error: unknown): never {
  if ((error as { code?: string }).code === "23505") throw slugTaken();
  throw error;
}

export async function createDrive(groupId: string, input: DriveInput) {
  await ensureSlugFree(input.slug);
  try {
    const [row] = await db("drives").insert({ ...driveRow(input), group_id: groupId }).returning(["id", "slug"]);
    return row as { id: string; slug: string };
  } catch (error) {
    rethrowUnique(error);
  }
}

export async function updateDrive(groupId: string, id: string, input: DriveInput) {
  await ensureSlugFree(input.slug, id);
  let updated = 0;
  try {
    updated = await db("drives").where({ id, group_id: groupId }).update({ ...driveRow(input), updated_at: db.fn.now() });
  } catch (error) {
    rethrowUnique(error);
  }
  if (!updated) throw notFound("That drive");
  return findDrive(groupId, id);
}

function pointRow(input: Partial<DropPointInput>) {
  const map: Record<string, string> = { hostName: "host_name", hostPhone: "host_phone", hostEmail: "host_email", capacityBags: "capacity_bags", openingHours: "opening_hours" };
  const row: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(input)) {
    if (value === undefined) continue;
    const column = map[key] ?? key;
    // jsonb: an array must go as JSON text (node-postgres would send a Postgres array).
    if (key === "openingHours") {
      row[column] = JSON.stringify(value);
      continue;
    }
    row[column] = (key === "hostName" || key === "hostPhone" || key === "hostEmail") && value === "" ? null : value;
  }
  return row;
}

/** The caller has checked that the drive is the group's (the route does, before parsing the body). */
export async function createDropPoint(groupId: string, driveId: string, input: DropPointInput) {
  const [row] = await db("drop_points").insert({ ...pointRow(input), group_id: groupId, drive_id: driveId }).returning(["id"]);
  return findDropPoint(groupId, row.id);
}

export async function updateDropPoint(groupId: string, id: string, input: Partial<DropPointInput>) {
  if (!UUID.test(id)) throw notFound("That drop point");
  const row = pointRow(input);
  const count = Object.keys(row).length
    ? await db("drop_points").where({ id, group_id: groupId }).update(row)
    : (await findDropPoint(groupId, id)) ? 1 : 0;
  if (!count) throw notFound("That drop point");
  return findDropPoint(groupId, id);
}
