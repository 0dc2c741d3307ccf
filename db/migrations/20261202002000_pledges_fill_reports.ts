import type { Knex } from "knex";

// Donors' pledges and the public's "this bin is full" reports. Both are
// written by anonymous visitors, so both keep the group for filtering.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("pledges", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").notNullable().references("drives.id").onDelete("CASCADE");
    t.uuid("drop_point_id").notNullable().references("drop_points.id").onDelete("CASCADE");
    t.string("name", 120);
    t.specificType("email", "citext");
    t.integer("bags").notNullable();
    t.date("bring_on").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["drive_id"]);
  });
  await knex.raw("alter table pledges add constraint pledges_bags_check check (bags between 1 and 50)");

  await knex.schema.createTable("fill_reports", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drop_point_id").notNullable().references("drop_points.id").onDelete("CASCADE");
    /** Share of the bin in use, in percent: 0, 25, 50, 75 or 100. */
    t.integer("level").notNullable();
    t.text("note").notNullable().defaultTo("");
    t.uuid("photo_file_id").references("files.id").onDelete("SET NULL");
    /** True on the one report per fill episode that e-mailed the organisers. */
    t.boolean("alerted").notNullable().defaultTo(false);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["drop_point_id", "created_at"]);
  });
  await knex.raw("alter table fill_reports add constraint fill_reports_level_check check (level between 0 and 100)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("fill_reports");
  await knex.schema.dropTableIfExists("pledges");
}
