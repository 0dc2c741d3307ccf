import type { Knex } from "knex";

// Structured opening hours for drop points, enough to answer "open on that
// day?" (lib/drives/opening-hours.ts): a JSON array of spans
// { days: ISO 8601 weekdays 1-7, opens: "HH:MM", closes: "HH:MM" }.
// The free-text `hours` column stays for notes. Empty array = not recorded.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("drop_points", (t) => {
    t.jsonb("opening_hours").notNullable().defaultTo(knex.raw("'[]'::jsonb"));
  });
  await knex.raw("alter table drop_points add constraint drop_points_opening_hours_array check (jsonb_typeof(opening_hours) = 'array')");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("drop_points", (t) => {
    t.dropChecks(["drop_points_opening_hours_array"]);
    t.dropColumn("opening_hours");
  });
}
