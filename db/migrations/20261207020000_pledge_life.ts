import type { Knex } from "knex";

// Issue 16, a pledge's life: the donor cancels it from the link in the
// confirmation mail (only the token's SHA-256 is kept), the organiser marks it
// received (optionally naming the haul that brought it) or not brought.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("pledges", (t) => {
    t.string("cancel_token_hash", 64).nullable().unique();
    t.string("status", 16).notNullable().defaultTo("pledged");
    t.timestamp("status_at", { useTz: true }).nullable();
    t.uuid("haul_id").nullable().references("hauls.id").onDelete("SET NULL");
  });
  await knex.raw("alter table pledges add constraint pledges_status_check check (status in ('pledged', 'cancelled', 'received', 'notBrought'))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("alter table pledges drop constraint if exists pledges_status_check");
  await knex.schema.alterTable("pledges", (t) => {
    t.dropColumn("haul_id");
    t.dropColumn("status_at");
    t.dropColumn("status");
    t.dropColumn("cancel_token_hash");
  });
}
