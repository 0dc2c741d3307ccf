import type { Knex } from "knex";
import bcrypt from "bcryptjs";
import { planColumns } from "../../lib/heaters/plan-columns";
import {
  DEMO_DRIVES,
  DEMO_DROP_POINTS,
  DEMO_GROUP,
  DEMO_HEATERS,
  DEMO_PASSWORD,
  DEMO_PEOPLE,
  OTHER_GROUP,
} from "./data/scenario";

// Groups, people, drives, drop points and heater units of the demo. The start
// script runs the seeds only on an empty database.
export async function seed(knex: Knex): Promise<void> {
  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  const groups: Record<string, string> = {};
  for (const [key, g] of [["demo", DEMO_GROUP], ["other", OTHER_GROUP]] as const) {
    const [row] = await knex("groups")
      .insert({ slug: g.slug, name: g.name, town: g.town, workshop_lat: g.workshop.lat, workshop_lng: g.workshop.lng })
      .returning("id");
    groups[key] = row.id;
  }
  const users: Record<string, string> = {};
  for (const p of DEMO_PEOPLE) {
    const [row] = await knex("users").insert({ email: p.email, name: p.name, password_hash: hash, email_verified_at: knex.fn.now() }).returning("id");
    users[p.email] = row.id;
    await knex("memberships").insert({ group_id: groups[p.group], user_id: row.id, role: p.role });
  }
  const drives: Record<string, { id: string; group: string }> = {};
  for (const d of DEMO_DRIVES) {
    const [row] = await knex("drives")
      .insert({
        group_id: groups[d.group],
        slug: d.slug,
        name: d.name,
        description: d.description,
        starts_on: d.startsOn,
        ends_on: d.endsOn,
        is_public: d.isPublic,
        wanted: "Standard 355 mL aluminium drink cans, empty, rinsed, undented and not crushed.",
      })
      .returning("id");
    drives[d.key] = { id: row.id, group: groups[d.group] };
  }
  for (const p of DEMO_DROP_POINTS) {
    await knex("drop_points").insert({
      group_id: drives[p.drive].group,
      drive_id: drives[p.drive].id,
      name: p.name,
      address: p.address,
      lat: p.lat,
      lng: p.lng,
      hours: p.hours,
      capacity_bags: p.capacity,
      host_name: p.host,
      host_phone: p.phone,
      active: p.drive !== "harvest",
    });
  }
  const builder = users["builder@cantrove.test"];
  for (const h of DEMO_HEATERS) {
    await knex("heater_units").insert({
      group_id: drives[h.drive].group,
      drive_id: drives[h.drive].id,
      builder_id: drives[h.drive].group === groups.demo ? builder : users["organiser@elsewhere.test"],
      name: h.name,
      // Stored resolved, as the app saves a plan: blanks take the defaults once, here.
      ...planColumns({
        glazingWidth: h.width,
        glazingHeight: h.height,
        unit: "in",
        coverage: h.coverage,
        manifoldHeight: h.coverage === "full" ? 5 : undefined,
        holesPerCan: 4,
      }),
      columns: h.cols,
      rows: h.rows,
      cans: h.cols * h.rows,
      state: h.state,
    });
  }
}
