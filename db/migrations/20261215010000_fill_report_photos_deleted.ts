import type { Knex } from "knex";
import { applyFunctions } from "../functions/apply";

// record_delete (db/functions/records.sql) also removes a deleted fill report's
// photo, and the photos of the fill reports that go with a deleted drop point or
// drive; before, their file rows stayed behind with nothing pointing at them.
export async function up(knex: Knex): Promise<void> {
  await applyFunctions(knex, "records.sql");
}

export async function down(): Promise<void> {
  // The earlier text of records.sql is not kept; the function stays as it is.
}
