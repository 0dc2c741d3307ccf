import type { Knex } from "knex";

// How a group's pages, mail, sheets and exports show dates, numbers and
// measures (lib/format): its locale and its units, beside the time zone it
// already has. Existing groups keep today's look: en-GB, metric.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("groups", (t) => {
    t.string("locale", 35).notNullable().defaultTo("en-GB");
    t.string("units", 8).notNullable().defaultTo("metric");
  });
  await knex.raw("alter table groups add constraint groups_units_check check (units in ('metric', 'imperial'))");
  // No "?" in the pattern: knex.raw would read it as a binding.
  await knex.raw("alter table groups add constraint groups_locale_check check (locale ~ '^[a-z]{2,3}(-[A-Z]{2}){0,1}$')");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("groups", (t) => {
    t.dropChecks(["groups_units_check", "groups_locale_check"]);
    t.dropColumns("locale", "units");
  });
}
