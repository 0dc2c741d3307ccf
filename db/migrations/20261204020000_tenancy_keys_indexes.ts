import type { Knex } from "knex";

// Tenancy by keys: every parent a group's rows point at is unique on
// (id, group_id), and every child refers to it by (parent_id, group_id), so the
// database refuses a child whose group differs from its parent's, whatever
// code writes it. The single-column foreign keys stay (they carry the existing
// ON DELETE rules); the composite ones copy those rules.
//
// Also the indexes the ledger's lookups by movement and by sort were missing.

const PARENTS = ["drives", "drop_points", "heater_units", "movements", "hauls", "sorts", "pickup_runs"];

// [child, column, parent, on delete]
const CHILDREN: [string, string, string, string][] = [
  ["drop_points", "drive_id", "drives", "cascade"],
  ["heater_units", "drive_id", "drives", "set null (drive_id)"],
  ["pledges", "drive_id", "drives", "cascade"],
  ["pledges", "drop_point_id", "drop_points", "cascade"],
  ["fill_reports", "drop_point_id", "drop_points", "cascade"],
  ["movements", "drive_id", "drives", "cascade"],
  ["sorts", "drive_id", "drives", "cascade"],
  ["sorts", "movement_id", "movements", "no action"],
  ["hauls", "drive_id", "drives", "cascade"],
  ["hauls", "drop_point_id", "drop_points", "no action"],
  ["hauls", "movement_id", "movements", "no action"],
  ["hauls", "sort_id", "sorts", "no action"],
  ["ledger_lines", "movement_id", "movements", "no action"],
  ["ledger_lines", "drive_id", "drives", "cascade"],
  ["ledger_lines", "drop_point_id", "drop_points", "no action"],
  ["ledger_lines", "heater_unit_id", "heater_units", "no action"],
  ["ledger_lines", "haul_id", "hauls", "no action"],
  ["ledger_lines", "sort_id", "sorts", "no action"],
  ["stage_balances", "drive_id", "drives", "cascade"],
  ["stage_balances", "drop_point_id", "drop_points", "cascade"],
  ["stage_balances", "heater_unit_id", "heater_units", "cascade"],
  ["reject_tallies", "drive_id", "drives", "cascade"],
  ["reject_tallies", "drop_point_id", "drop_points", "cascade"],
  ["drop_point_tallies", "drive_id", "drives", "cascade"],
  ["drop_point_tallies", "drop_point_id", "drop_points", "cascade"],
  ["pickup_runs", "drive_id", "drives", "cascade"],
  ["pickup_run_stops", "run_id", "pickup_runs", "cascade"],
  ["pickup_run_stops", "drop_point_id", "drop_points", "cascade"],
  ["pickup_run_stops", "haul_id", "hauls", "no action"],
];

const fkName = (child: string, column: string) => `${child}_${column}_group_fk`;

export async function up(knex: Knex): Promise<void> {
  for (const parent of PARENTS) {
    await knex.raw(`alter table ${parent} add constraint ${parent}_id_group_key unique (id, group_id)`);
  }
  for (const [child, column, parent, onDelete] of CHILDREN) {
    await knex.raw(
      `alter table ${child} add constraint ${fkName(child, column)} foreign key (${column}, group_id) references ${parent} (id, group_id) on delete ${onDelete}`,
    );
  }
  await knex.raw("create unique index hauls_movement_id on hauls (movement_id)");
  await knex.raw("create index hauls_sort_id on hauls (sort_id) where sort_id is not null");
  await knex.raw("create unique index sorts_movement_id on sorts (movement_id)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists sorts_movement_id");
  await knex.raw("drop index if exists hauls_sort_id");
  await knex.raw("drop index if exists hauls_movement_id");
  for (const [child, column] of CHILDREN) await knex.raw(`alter table ${child} drop constraint if exists ${fkName(child, column)}`);
  for (const parent of PARENTS) await knex.raw(`alter table ${parent} drop constraint if exists ${parent}_id_group_key`);
}
