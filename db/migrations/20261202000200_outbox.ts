import type { Knex } from "knex";

// Every e-mail is written here first and sent after, so a mail service that
// is down delays a message instead of losing it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("outbox", (t) => {
    t.bigIncrements("id").primary();
    t.uuid("group_id").references("groups.id").onDelete("CASCADE");
    t.specificType("to_address", "citext").notNullable();
    t.string("subject", 240).notNullable();
    t.text("text_body").notNullable();
    t.text("html_body");
    t.string("kind", 40).notNullable().defaultTo("notice");
    t.string("status", 10).notNullable().defaultTo("queued");
    t.integer("attempts").notNullable().defaultTo(0);
    t.text("last_error");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("next_attempt_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("sent_at", { useTz: true });
    t.index(["group_id", "created_at"]);
  });
  await knex.raw("alter table outbox add constraint outbox_status_check check (status in ('queued','sent','failed'))");
  await knex.raw("create index outbox_due_idx on outbox (next_attempt_at) where status = 'queued'");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("outbox");
}
