import type { Knex } from "knex";

// The shared spine every area hangs off: groups, people, their roles, drives,
// drop points and heater units. Later migrations add columns and tables; this
// one stays small so each area can evolve its own part.
export async function up(knex: Knex): Promise<void> {
  await knex.raw("create extension if not exists citext");

  await knex.schema.createTable("groups", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.string("slug", 64).notNullable().unique();
    t.string("name", 120).notNullable();
    t.string("town", 120);
    t.double("workshop_lat");
    t.double("workshop_lng");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("users", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.specificType("email", "citext").notNullable().unique();
    t.string("name", 120).notNullable();
    t.string("password_hash", 100);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("memberships", (t) => {
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.string("role", 16).notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["group_id", "user_id"]);
    t.index(["user_id"]);
  });
  await knex.raw(
    "alter table memberships add constraint memberships_role_check check (role in ('organiser','volunteer','builder'))",
  );

  await knex.schema.createTable("drives", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.string("slug", 80).notNullable().unique();
    t.string("name", 120).notNullable();
    t.text("description").notNullable().defaultTo("");
    t.text("wanted").notNullable().defaultTo("");
    t.date("starts_on").notNullable();
    t.date("ends_on").notNullable();
    t.boolean("is_public").notNullable().defaultTo(true);
    t.decimal("spare_percent", 5, 2).notNullable().defaultTo(5);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["group_id"]);
  });
  await knex.raw("alter table drives add constraint drives_dates_check check (ends_on >= starts_on)");

  await knex.schema.createTable("drop_points", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").notNullable().references("drives.id").onDelete("CASCADE");
    t.string("name", 120).notNullable();
    t.string("address", 240).notNullable().defaultTo("");
    t.double("lat").notNullable();
    t.double("lng").notNullable();
    t.string("hours", 240).notNullable().defaultTo("");
    t.text("access_notes").notNullable().defaultTo("");
    t.string("host_name", 120);
    t.string("host_phone", 40);
    t.specificType("host_email", "citext");
    t.integer("capacity_bags").notNullable().defaultTo(6);
    t.boolean("active").notNullable().defaultTo(true);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["drive_id"]);
    t.index(["group_id"]);
  });
  await knex.raw(
    "alter table drop_points add constraint drop_points_coords_check check (lat between -90 and 90 and lng between -180 and 180)",
  );

  await knex.schema.createTable("heater_units", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").references("drives.id").onDelete("SET NULL");
    t.uuid("builder_id").references("users.id").onDelete("SET NULL");
    t.string("name", 120).notNullable();
    t.string("unit", 2).notNullable().defaultTo("mm");
    t.string("coverage", 8).notNullable().defaultTo("chamber");
    t.double("glazing_width").notNullable();
    t.double("glazing_height").notNullable();
    t.double("manifold_height");
    t.double("can_diameter");
    t.double("can_length");
    t.double("edge_clearance");
    t.integer("holes_per_can").notNullable().defaultTo(4);
    t.integer("columns").notNullable();
    t.integer("rows").notNullable();
    t.integer("cans").notNullable();
    t.string("state", 12).notNullable().defaultTo("planned");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["group_id"]);
    t.index(["drive_id"]);
  });
  await knex.raw(
    "alter table heater_units add constraint heater_units_state_check check (state in ('planned','claiming','building','installed'))",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("heater_units");
  await knex.schema.dropTableIfExists("drop_points");
  await knex.schema.dropTableIfExists("drives");
  await knex.schema.dropTableIfExists("memberships");
  await knex.schema.dropTableIfExists("users");
  await knex.schema.dropTableIfExists("groups");
}
