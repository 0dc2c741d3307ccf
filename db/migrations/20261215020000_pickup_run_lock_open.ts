import type { Knex } from "knex";
import { applyFunctions } from "../functions/apply";

// pickup_run_edit and pickup_run_cancel share pickup_run_lock_open (the drive's
// lock, the run's row, the open-run check) instead of each holding a copy, and a
// new stop cannot be an archived drop point; record_delete answers 404 when
// nothing was deleted and deletes only photos as photos.
export async function up(knex: Knex): Promise<void> {
  await applyFunctions(knex, "pickup_runs.sql", "records.sql");
}

export async function down(): Promise<void> {
  // The two functions keep calling the helper; the earlier text of pickup_runs.sql is not kept.
}
