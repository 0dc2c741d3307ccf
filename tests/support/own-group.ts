import { randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import type { TestDb } from "./db";
import { DEMO_PASSWORD } from "./env";
import { planColumns } from "@/lib/heaters/plan-columns";

// A group of its own for a test that must see its ledger untouched by the
// other test files running at the same time against the same database.
export interface OwnGroup {
  groupId: string;
  driveId: string;
  driveSlug: string;
  dropPointId: string;
  heaterId: string;
  emails: { organiser: string; volunteer: string; builder: string };
}

export async function createOwnGroup(db: TestDb, label: string, names: { drive?: string; dropPoint?: string; heater?: string } = {}): Promise<OwnGroup> {
  const tag = `${label}-${randomBytes(4).toString("hex")}`;
  const hash = await bcrypt.hash(DEMO_PASSWORD, 4);
  const [group] = await db("groups").insert({ slug: tag, name: `Larkhollow ${label} circle`, town: "Larkhollow" }).returning("id");
  const emails = { organiser: `organiser+${tag}@cantrove.test`, volunteer: `volunteer+${tag}@cantrove.test`, builder: `builder+${tag}@cantrove.test` };
  const ids: Record<string, string> = {};
  for (const [role, email] of Object.entries(emails)) {
    const [u] = await db("users").insert({ email, name: `${role} of ${label}`, password_hash: hash, email_verified_at: db.fn.now() }).returning("id");
    await db("memberships").insert({ group_id: group.id, user_id: u.id, role });
    ids[role] = u.id;
  }
  const [drive] = await db("drives")
    .insert({ group_id: group.id, slug: `${tag}-drive`, name: names.drive ?? `${label} drive`, starts_on: "2026-11-01", ends_on: "2027-02-28", is_public: true })
    .returning(["id", "slug"]);
  const [point] = await db("drop_points")
    .insert({ group_id: group.id, drive_id: drive.id, name: names.dropPoint ?? `${label} porch`, lat: 52.0, lng: -1.6, hours: "Daily 8-20" })
    .returning("id");
  const [heater] = await db("heater_units")
    .insert({ group_id: group.id, drive_id: drive.id, builder_id: ids.builder, name: names.heater ?? `${label} heater`, ...planColumns({ glazingWidth: 900, glazingHeight: 1800, unit: "mm", coverage: "chamber" }), columns: 13, rows: 14, cans: 182 })
    .returning("id");
  return { groupId: group.id, driveId: drive.id, driveSlug: drive.slug, dropPointId: point.id, heaterId: heater.id, emails };
}

/** One digest of everything the ledger holds for a group: lines, movements, hauls, sorts and every running total. */
export async function ledgerDigest(db: TestDb, groupId: string): Promise<string> {
  const { rows } = await db.raw(
    `select md5(concat_ws('|',
       (select string_agg(concat_ws(',', id, movement_id, from_stage, to_stage, quantity, reason, drop_point_id, heater_unit_id, reverses_id), ';' order by id) from ledger_lines where group_id = :g),
       (select string_agg(concat_ws(',', id, kind, reverses_movement_id), ';' order by id) from movements where group_id = :g),
       (select string_agg(concat_ws(',', id, bags, weight_kg, estimated_cans, sort_id, reversed_at), ';' order by id) from hauls where group_id = :g),
       (select string_agg(concat_ws(',', id, good, counted, reversed_at), ';' order by id) from sorts where group_id = :g),
       (select string_agg(concat_ws(',', drive_id, drop_point_id, heater_unit_id, stage, quantity), ';' order by drive_id, drop_point_id, heater_unit_id, stage) from stage_balances where group_id = :g),
       (select string_agg(concat_ws(',', drive_id, drop_point_id, reason, quantity), ';' order by drive_id, drop_point_id, reason) from reject_tallies where group_id = :g),
       (select string_agg(concat_ws(',', drop_point_id, hauls, bags, good_cans, rejected_cans), ';' order by drop_point_id) from drop_point_tallies where group_id = :g),
       (select string_agg(concat_ws(',', d.drive_id, d.day, d.good_cans), ';' order by d.drive_id, d.day) from drive_daily_good d join drives v on v.id = d.drive_id where v.group_id = :g),
       (select concat_ws(',', weight_hauls, weight_cans, weight_kg, bag_hauls, bag_cans, bags) from group_calibration where group_id = :g)
     )) as digest`,
    { g: groupId },
  );
  return rows[0].digest as string;
}
