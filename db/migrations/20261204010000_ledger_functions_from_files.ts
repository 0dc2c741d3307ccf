import type { Knex } from "knex";
import { applyFunctions } from "../functions/apply";
import { up as firstLedgerPost } from "./20261202006000_ledger_post_function";
import { up as lossesAndCounts } from "./20261203070000_losses_stock_counts";

// ledger_post and the ledger's writers now live in db/functions/*.sql. The old
// helpers that parsed the lines again are replaced by ones that take the lines
// parsed once (ledger_post.sql).
export async function up(knex: Knex): Promise<void> {
  await knex.raw("drop function if exists ledger_post_loss_tallies(jsonb, uuid, uuid)");
  await knex.raw("drop function if exists ledger_post(jsonb)");
  await knex.raw("drop function if exists ledger_post_deltas(jsonb)");
  await applyFunctions(knex, "ledger_post.sql", "ledger_writers.sql");
}

export async function down(knex: Knex): Promise<void> {
  for (const f of ["ledger_unit(jsonb)", "ledger_reverse(jsonb)", "ledger_sort(jsonb)", "ledger_apply_calibration(uuid, jsonb, integer)", "ledger_bump_drop_point(uuid, uuid, uuid, integer, integer)", "ledger_haul(jsonb)", "ledger_post(jsonb)", "ledger_post_deltas(ledger_line_in[])", "ledger_lock_drive(uuid, uuid)"]) {
    await knex.raw(`drop function if exists ${f}`);
  }
  await knex.raw("drop type if exists ledger_line_in");
  await firstLedgerPost(knex);
  await lossesAndCounts(knex);
}
