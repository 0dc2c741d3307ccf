import type { Knex } from "knex";

// Issue 16 ("nothing stuck"): the organiser's search, and the e-mail
// notifications (run reminder, weekly summary, unit ready) with their opt-outs
// and one-send claims.
//
// Search uses pg_trgm (trigram similarity; it also serves ILIKE '%word%') with
// btree_gin, so each index leads with group_id and a group's search never
// walks another group's rows. Both extensions ship with PostgreSQL's contrib
// (Debian's postgresql-15 package carries them).
const DROP_POINT_TEXT = "(name || ' ' || address || ' ' || hours || ' ' || access_notes || ' ' || coalesce(host_name, ''))";
const DRIVE_TEXT = "(name || ' ' || description)";
const UNIT_TEXT = "(name || ' ' || notes)";

export async function up(knex: Knex): Promise<void> {
  await knex.raw("create extension if not exists pg_trgm");
  await knex.raw("create extension if not exists btree_gin");
  await knex.raw(`create index drop_points_search_idx on drop_points using gin (group_id, ${DROP_POINT_TEXT} gin_trgm_ops)`);
  await knex.raw(`create index drives_search_idx on drives using gin (group_id, ${DRIVE_TEXT} gin_trgm_ops)`);
  await knex.raw(`create index heater_units_search_idx on heater_units using gin (group_id, ${UNIT_TEXT} gin_trgm_ops)`);
  await knex.raw("create index users_name_search_idx on users using gin (name gin_trgm_ops)");
  // Most ledger lines carry no note; only those that do are indexed.
  await knex.raw("create index ledger_lines_note_search_idx on ledger_lines using gin (group_id, note gin_trgm_ops) where note <> ''");

  // A person's "don't send me this kind" switch; no row means the mail is sent.
  await knex.schema.createTable("notification_optouts", (t) => {
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.string("kind", 24).notNullable();
    t.string("via", 12).notNullable().defaultTo("settings");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["user_id", "kind"]);
  });
  await knex.raw("alter table notification_optouts add constraint notification_optouts_kind_check check (kind in ('runReminder','weeklySummary','unitReady'))");
  await knex.raw("alter table notification_optouts add constraint notification_optouts_via_check check (via in ('settings','oneClick','link'))");

  // One row per notification ever sent: the primary key is the claim, so two
  // servers sweeping at once send it once (as pledge_confirmations does).
  await knex.schema.createTable("notification_sends", (t) => {
    t.string("kind", 24).notNullable();
    t.string("key", 200).notNullable();
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("user_id").references("users.id").onDelete("SET NULL");
    t.bigInteger("outbox_id").references("outbox.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["kind", "key"]);
    t.index(["group_id", "created_at"]);
  });

  // Headers an e-mail carries besides the usual ones (List-Unsubscribe, RFC 8058).
  await knex.schema.alterTable("outbox", (t) => {
    t.jsonb("headers");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("outbox", (t) => t.dropColumn("headers"));
  await knex.schema.dropTableIfExists("notification_sends");
  await knex.schema.dropTableIfExists("notification_optouts");
  for (const index of ["ledger_lines_note_search_idx", "users_name_search_idx", "heater_units_search_idx", "drives_search_idx", "drop_points_search_idx"]) {
    await knex.raw(`drop index if exists ${index}`);
  }
}
