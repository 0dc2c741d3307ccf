import type { Knex } from "knex";
import { applyFunctions } from "../functions/apply";

// Issue 16, runs: a pickup run can be edited (date, volunteer, stops) and
// cancelled. A cancelled run stays, stamped, with its stops: the ones still
// pending become `released` (history kept; the hauls already logged keep their
// stops and their ledger lines). The edits and the cancel are one database call
// each (db/functions/pickup_runs.sql), under the drive's lock like the ledger's
// writers, so they never cross a haul or an undo at the same stop.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("pickup_runs", (t) => {
    t.timestamp("cancelled_at", { useTz: true }).nullable();
    t.uuid("cancelled_by").nullable().references("users.id").onDelete("SET NULL");
    t.text("cancel_reason").nullable();
    t.timestamp("updated_at", { useTz: true }).nullable();
  });
  await knex.raw("alter table pickup_runs drop constraint pickup_runs_state_check");
  await knex.raw("alter table pickup_runs add constraint pickup_runs_state_check check (state in ('planned','under_way','done','cancelled'))");
  await knex.raw("alter table pickup_runs add constraint pickup_runs_cancelled_check check ((state = 'cancelled') = (cancelled_at is not null))");
  await knex.raw("alter table pickup_run_stops drop constraint pickup_run_stops_status_check");
  await knex.raw("alter table pickup_run_stops add constraint pickup_run_stops_status_check check (status in ('pending','logged','skipped','released'))");
  await knex.raw("alter table pickup_run_stops drop constraint pickup_run_stops_evidence_check");
  await knex.raw(`alter table pickup_run_stops add constraint pickup_run_stops_evidence_check check (
    (status in ('pending','released') and haul_id is null and skip_reason is null)
    or (status = 'logged' and haul_id is not null)
    or (status = 'skipped' and skip_reason is not null and length(trim(skip_reason)) > 0))`);
  await applyFunctions(knex, "ledger_writers.sql", "pickup_runs.sql");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop function if exists pickup_run_edit(jsonb)");
  await knex.raw("drop function if exists pickup_run_cancel(jsonb)");
  await knex.raw("update pickup_run_stops set status = 'pending' where status = 'released'");
  await knex.raw("update pickup_runs set state = 'planned' where state = 'cancelled'");
  await knex.raw("alter table pickup_runs drop constraint pickup_runs_cancelled_check");
  await knex.raw("alter table pickup_runs drop constraint pickup_runs_state_check");
  await knex.raw("alter table pickup_runs add constraint pickup_runs_state_check check (state in ('planned','under_way','done'))");
  await knex.raw("alter table pickup_run_stops drop constraint pickup_run_stops_status_check");
  await knex.raw("alter table pickup_run_stops add constraint pickup_run_stops_status_check check (status in ('pending','logged','skipped'))");
  await knex.raw("alter table pickup_run_stops drop constraint pickup_run_stops_evidence_check");
  await knex.raw(`alter table pickup_run_stops add constraint pickup_run_stops_evidence_check check (
    (status = 'pending' and haul_id is null and skip_reason is null)
    or (status = 'logged' and haul_id is not null)
    or (status = 'skipped' and skip_reason is not null and length(trim(skip_reason)) > 0))`);
  await knex.schema.alterTable("pickup_runs", (t) => {
    t.dropColumn("cancelled_at");
    t.dropColumn("cancelled_by");
    t.dropColumn("cancel_reason");
    t.dropColumn("updated_at");
  });
}
