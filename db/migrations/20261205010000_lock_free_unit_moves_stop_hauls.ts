import type { Knex } from "knex";
import { applyFunctions } from "../functions/apply";

// The last ledger writes that held the drive's lock across round trips become
// one database call each: a heater unit's state move (heater_unit_move), a
// haul logged at a pickup-run stop (ledger_haul with p.stop, and
// pickup_run_follow_stops, which ledger_reverse now shares) and a claim moved
// between units (ledger_units).
export const up = (knex: Knex) => applyFunctions(knex, "ledger_writers.sql", "heater_units.sql");

// The previous ledger_haul and ledger_reverse texts are in git, not in the database
// (ledger_reverse's current text calls pickup_run_follow_stops, so that one stays).
export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop function if exists heater_unit_move(jsonb)");
  await knex.raw("drop function if exists ledger_units(jsonb)");
}
