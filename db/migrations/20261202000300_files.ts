import type { Knex } from "knex";

// Files stored by the upload service; the row is written by the upload
// callback, so a file the service never confirmed is never referenced.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("files", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").references("groups.id").onDelete("CASCADE");
    t.uuid("uploaded_by").references("users.id").onDelete("SET NULL");
    t.string("key", 200).notNullable().unique();
    t.text("url").notNullable();
    t.string("name", 240).notNullable();
    t.integer("size").notNullable();
    t.string("mime", 100).notNullable();
    t.string("purpose", 40).notNullable();
    t.uuid("subject_id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["purpose", "subject_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("files");
}
