import "server-only";
import { db } from "@/lib/db";

export async function listDrives(groupId: string) {
  return db("drives as d")
    .select(
      "d.id",
      "d.slug",
      "d.name",
      db.raw(`to_char(d.starts_on, 'YYYY-MM-DD') as "startsOn"`),
      db.raw(`to_char(d.ends_on, 'YYYY-MM-DD') as "endsOn"`),
      "d.is_public as isPublic",
      db.raw(`(select count(*)::int from drop_points p where p.drive_id = d.id and p.group_id = d.group_id) as "dropPoints"`),
      db.raw(`(select count(*)::int from heater_units h where h.drive_id = d.id and h.group_id = d.group_id) as "heaterUnits"`),
    )
    .where("d.group_id", groupId)
    .orderBy([{ column: "d.starts_on", order: "desc" }, { column: "d.name" }]);
}
