import type { Knex } from "knex";

// Bin fill as state: an organiser's "clear" ends a drop point's fill episode
// like a haul does. The group's time zone, for the ledger's local times and
// day filters. The ledger is listed by when it happened, then by line.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("drop_points", (t) => {
    t.timestamp("fill_cleared_at", { useTz: true });
  });
  // The demo groups are on an invented stretch of the Atlantic coast; Europe/London is their clock.
  await knex.schema.alterTable("groups", (t) => {
    t.string("time_zone", 64).notNullable().defaultTo("Europe/London");
  });
  await knex.raw("create index ledger_lines_group_occurred on ledger_lines (group_id, occurred_at desc, id desc)");
  await knex.raw("create index ledger_lines_drive_occurred on ledger_lines (drive_id, occurred_at desc, id desc)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists ledger_lines_drive_occurred");
  await knex.raw("drop index if exists ledger_lines_group_occurred");
  await knex.schema.alterTable("groups", (t) => t.dropColumn("time_zone"));
  await knex.schema.alterTable("drop_points", (t) => t.dropColumn("fill_cleared_at"));
}
