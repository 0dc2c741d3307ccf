import type { Knex } from "knex";

// The drive a person last chose to work on, per membership, so every page where
// cans are entered opens on it instead of on the newest drive. A deleted drive
// leaves no dangling choice: the pages then fall back to the default rule
// (lib/drives/current-drive.ts).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("memberships", (t) => {
    t.uuid("current_drive_id").nullable().references("drives.id").onDelete("SET NULL");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("memberships", (t) => t.dropColumn("current_drive_id"));
}
