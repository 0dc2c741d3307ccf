import type { Knex } from "knex";
import { applyFunctions } from "../functions/apply";

// A unit's spare share, ⌈cans × spare % / 100⌉, was written out in the need trigger,
// in heater_unit_glazing and again in TypeScript (lib/heaters/need.ts). It is now one
// SQL function, unit_spare (db/functions/unit_need.sql): the trigger and the glazing
// check call it, and the app reads a unit's spare from it, so the figure people see
// is the one the database enforces.
export async function up(knex: Knex): Promise<void> {
  await applyFunctions(knex, "unit_need.sql", "heater_unit_archive.sql");
}

// The earlier texts of both functions are in git; unit_spare stays, since they call it.
export async function down(): Promise<void> {}
