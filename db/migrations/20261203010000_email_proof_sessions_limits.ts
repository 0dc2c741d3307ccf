import type { Knex } from "knex";

// Proven e-mail addresses, a per-person session version, and the store of the
// rate limits (rate-limiter-flexible's PostgreSQL layout) that replaces our
// own failed-sign-in rows.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    t.timestamp("email_verified_at", { useTz: true });
    // Carried in the session token; bumping it ends every session issued before.
    t.integer("session_version").notNullable().defaultTo(1);
  });
  // People who had accounts before addresses were proven had no way to prove
  // theirs; locking them all out would be worse. Every one of their sessions
  // still ends (their tokens carry no session version), so a session opened
  // under someone else's address does not survive this change.
  await knex("users").update({ email_verified_at: knex.fn.now() });

  await knex.schema.createTable("email_verifications", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.string("token_hash", 64).notNullable().unique();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.index(["user_id"]);
  });

  // The columns rate-limiter-flexible's RateLimiterPostgres reads and writes
  // (key, points, expire in epoch ms); key is text so e-mail keys always fit.
  await knex.schema.createTable("rate_limits", (t) => {
    t.text("key").primary();
    t.integer("points").notNullable().defaultTo(0);
    t.bigInteger("expire");
  });

  await knex.schema.dropTableIfExists("sign_in_failures");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.createTable("sign_in_failures", (t) => {
    t.bigIncrements("id").primary();
    t.specificType("email", "citext").notNullable();
    t.string("client", 64).notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email", "at"]);
    t.index(["client", "at"]);
  });
  await knex.schema.dropTableIfExists("rate_limits");
  await knex.schema.dropTableIfExists("email_verifications");
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("session_version");
    t.dropColumn("email_verified_at");
  });
}
