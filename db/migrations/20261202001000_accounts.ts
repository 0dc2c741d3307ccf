import type { Knex } from "knex";

// Invitations, password resets and failed sign-ins. Tokens are stored only as
// SHA-256 hashes, so a copy of the database cannot be used to join a group or
// take over an account.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("invitations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.specificType("email", "citext").notNullable();
    t.string("role", 16).notNullable();
    t.string("token_hash", 64).notNullable().unique();
    t.uuid("invited_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("sent_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true });
    t.uuid("accepted_by").references("users.id").onDelete("SET NULL");
    t.timestamp("revoked_at", { useTz: true });
    t.index(["group_id"]);
  });
  await knex.raw(
    "alter table invitations add constraint invitations_role_check check (role in ('organiser','volunteer','builder'))",
  );
  // One open invitation per address and group; accepted or revoked ones stay as history.
  await knex.raw(
    "create unique index invitations_open_idx on invitations (group_id, email) where accepted_at is null and revoked_at is null",
  );

  await knex.schema.createTable("password_resets", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.string("token_hash", 64).notNullable().unique();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.index(["user_id"]);
  });

  // Counted in the database rather than in memory so every app server sees the same numbers.
  await knex.schema.createTable("sign_in_failures", (t) => {
    t.bigIncrements("id").primary();
    t.specificType("email", "citext").notNullable();
    t.string("client", 64).notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email", "at"]);
    t.index(["client", "at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("sign_in_failures");
  await knex.schema.dropTableIfExists("password_resets");
  await knex.schema.dropTableIfExists("invitations");
}
