import type { Knex } from "knex";

// What a saved plan needs beyond the core columns: the frame allowances that
// give the box's outer size, an optional note, and when the state last moved.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("heater_units", (t) => {
    t.double("frame_allowance_width");
    t.double("frame_allowance_height");
    t.text("notes").notNullable().defaultTo("");
    t.timestamp("state_changed_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw(
    "alter table heater_units add constraint heater_units_grid_check check (columns >= 0 and rows >= 0 and cans = columns * rows and holes_per_can >= 1)",
  );
  await knex.raw("alter table heater_units add constraint heater_units_unit_check check (unit in ('mm','in'))");
  await knex.raw("alter table heater_units add constraint heater_units_coverage_check check (coverage in ('chamber','full'))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("alter table heater_units drop constraint if exists heater_units_coverage_check");
  await knex.raw("alter table heater_units drop constraint if exists heater_units_unit_check");
  await knex.raw("alter table heater_units drop constraint if exists heater_units_grid_check");
  await knex.schema.alterTable("heater_units", (t) => {
    t.dropColumn("state_changed_at");
    t.dropColumn("notes");
    t.dropColumn("frame_allowance_height");
    t.dropColumn("frame_allowance_width");
  });
}
