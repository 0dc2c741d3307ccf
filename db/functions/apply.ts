import { readFileSync } from "node:fs";
import path from "node:path";
import type { Knex } from "knex";

// Runs the named files of db/functions/ (each written with create or replace),
// so a migration re-applies a function's current text in one line:
//   export const up = (knex: Knex) => applyFunctions(knex, "ledger_post.sql");
export async function applyFunctions(knex: Knex, ...files: string[]): Promise<void> {
  for (const file of files) {
    // Knex reads every ? as a binding; a file has none, so each is escaped to stay SQL.
    await knex.raw(readFileSync(path.join(import.meta.dirname, file), "utf8").replaceAll("?", "\\?"));
  }
}
