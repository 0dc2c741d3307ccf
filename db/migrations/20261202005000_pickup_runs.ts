import type { Knex } from "knex";

// Pickup runs: an ordered route over drop points for one volunteer, and its
// stops. A stop's haul lives in the ledger; the stop only points at it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("pickup_runs", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").notNullable().references("drives.id").onDelete("CASCADE");
    t.date("planned_on").notNullable();
    t.double("start_lat").notNullable();
    t.double("start_lng").notNullable();
    t.boolean("return_to_start").notNullable().defaultTo(false);
    // Kept as planned so the page shows the length the organiser agreed to.
    t.double("distance_km").notNullable();
    t.uuid("assignee_id").references("users.id").onDelete("SET NULL");
    t.string("state", 12).notNullable().defaultTo("planned");
    t.text("notes").notNullable().defaultTo("");
    t.uuid("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("started_at", { useTz: true });
    t.timestamp("finished_at", { useTz: true });
    t.index(["group_id", "state"]);
    t.index(["assignee_id"]);
  });
  await knex.raw(
    "alter table pickup_runs add constraint pickup_runs_state_check check (state in ('planned','under_way','done'))",
  );
  await knex.raw(
    "alter table pickup_runs add constraint pickup_runs_start_check check (start_lat between -90 and 90 and start_lng between -180 and 180)",
  );

  await knex.schema.createTable("pickup_run_stops", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("run_id").notNullable().references("pickup_runs.id").onDelete("CASCADE");
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drop_point_id").notNullable().references("drop_points.id").onDelete("CASCADE");
    t.integer("position").notNullable();
    t.double("leg_km").notNullable();
    t.string("status", 8).notNullable().defaultTo("pending");
    t.text("skip_reason");
    t.uuid("haul_id").references("hauls.id");
    t.uuid("resolved_by").references("users.id").onDelete("SET NULL");
    t.timestamp("resolved_at", { useTz: true });
    t.unique(["run_id", "position"]);
    t.unique(["run_id", "drop_point_id"]);
    t.index(["drop_point_id"]);
  });
  // One haul settles one stop.
  await knex.raw("create unique index pickup_run_stops_haul_unique on pickup_run_stops (haul_id) where haul_id is not null");
  await knex.raw(
    "alter table pickup_run_stops add constraint pickup_run_stops_status_check check (status in ('pending','logged','skipped'))",
  );
  // A stop's status and its evidence go together: logged has a haul, skipped a reason.
  await knex.raw(`alter table pickup_run_stops add constraint pickup_run_stops_evidence_check check (
    (status = 'pending' and haul_id is null and skip_reason is null)
    or (status = 'logged' and haul_id is not null)
    or (status = 'skipped' and skip_reason is not null and length(trim(skip_reason)) > 0))`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("pickup_run_stops");
  await knex.schema.dropTableIfExists("pickup_runs");
}
