import type { Knex } from "knex";

// One pledge confirmation per address, drive and calendar day (UTC): the
// primary key is the claim, so concurrent pledges cannot both send one.
// The address is kept only as a hash: this table is a counter, not a list.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("pledge_confirmations", (t) => {
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").notNullable().references("drives.id").onDelete("CASCADE");
    t.string("address_hash", 64).notNullable();
    t.date("day").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["drive_id", "address_hash", "day"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("pledge_confirmations");
}
