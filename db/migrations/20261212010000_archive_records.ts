import type { Knex } from "knex";
import { applyFunctions } from "../functions/apply";

// Issue 16, "archive, never lose": drives, drop points, photos, pledges and fill
// reports carry archived_at like heater units; records.sql stamps them
// (archive_stamp, shared with heater_unit_archive) and deletes only what no
// ledger line refers to. heater_units.sql gains the lock-and-release helpers its
// writers share, and heater_unit_archive.sql the glazing change.
const TABLES = ["drives", "drop_points", "files", "pledges", "fill_reports"] as const;

export async function up(knex: Knex): Promise<void> {
  for (const table of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.timestamp("archived_at", { useTz: true }).nullable();
    });
  }
  await applyFunctions(knex, "records.sql", "heater_units.sql", "heater_unit_archive.sql");
}

// The previous heater function texts are in git, not in the database.
export async function down(knex: Knex): Promise<void> {
  for (const fn of ["record_delete(jsonb)", "record_archive(jsonb)", "record_table(text)", "heater_unit_glazing(jsonb)"]) {
    await knex.raw(`drop function if exists ${fn}`);
  }
  for (const table of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.dropColumn("archived_at");
    });
  }
}
