import type { Knex } from "knex";

// A few donors' pledges and one fill report on the winter drive, so the
// organiser's drive page has something to show. Names and addresses invented.
const PLEDGES = [
  { point: "Hilltop Corner Shop", name: "Ada Wrenfield", email: "ada.wrenfield@example.test", bags: 2, inDays: 2 },
  { point: "Larkhollow Library porch", name: null, email: null, bags: 1, inDays: 4 },
  { point: "Quayside Community Hall", name: "Corin Hale", email: null, bags: 5, inDays: 6 },
];

export async function seed(knex: Knex): Promise<void> {
  const drive = await knex("drives").where({ slug: "larkhollow-winter-2026" }).first();
  if (!drive) return;
  const points = await knex("drop_points").where({ drive_id: drive.id });
  const byName = new Map(points.map((p) => [p.name as string, p]));
  for (const p of PLEDGES) {
    const point = byName.get(p.point);
    if (!point) continue;
    await knex("pledges").insert({
      group_id: drive.group_id,
      drive_id: drive.id,
      drop_point_id: point.id,
      name: p.name,
      email: p.email,
      bags: p.bags,
      bring_on: knex.raw(`current_date + ?::int`, [p.inDays]),
    });
  }
  const school = byName.get("Millbrook School gate");
  if (school) {
    await knex("fill_reports").insert({ group_id: drive.group_id, drop_point_id: school.id, level: 50, note: "Half full after the school fair." });
  }
}
