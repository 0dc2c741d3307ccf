import type { Knex } from "knex";
import { applyFunctions } from "../functions/apply";

// Issue 16: a heater unit can be archived (hidden from lists and targets, its
// unbuilt claims given back through the ledger) and restored. The ledger keeps
// every line; only the unit carries the stamp.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("heater_units", (t) => {
    t.timestamp("archived_at", { useTz: true }).nullable();
  });
  await applyFunctions(knex, "ledger_writers.sql", "heater_unit_archive.sql");
}

// The previous ledger_unit text is in git, not in the database.
export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop function if exists heater_unit_archive(jsonb)");
  await knex.schema.alterTable("heater_units", (t) => {
    t.dropColumn("archived_at");
  });
}
