import type { Knex } from "knex";

// The can ledger. `ledger_lines` is append-only (a trigger refuses UPDATE and
// DELETE for every role, the owner included); a correction is a new reversing
// line. The running-total tables are written in the same transaction as the
// lines, so reads never scan the ledger and stay exact.
//
// A line moves `quantity` cans from `from_stage` to `to_stage`; a null side
// is "outside the ledger" (a haul brings cans in, a sort closes an estimate,
// a release ends a claim). `claimed` is a reservation on processed cans, kept
// per heater unit, not a place cans physically sit.
const STAGES = ["hauled", "good", "washed", "opened", "punched", "claimed", "builtIn", "rejected", "recycled"];
const REASONS = ["dented", "crushed", "wrongSize", "notAluminium", "damaged", "other"];
const KINDS = ["haul", "sort", "processing", "claim", "release", "builtIn", "recycling", "reversal"];

const list = (values: string[]) => values.map((v) => `'${v}'`).join(",");

export async function up(knex: Knex): Promise<void> {
  // One movement = the lines written together by one action; reversals undo a whole movement.
  await knex.schema.createTable("movements", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").notNullable().references("drives.id").onDelete("CASCADE");
    t.string("kind", 16).notNullable();
    t.uuid("recorded_by").notNullable().references("users.id");
    t.timestamp("occurred_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("recorded_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("reverses_movement_id").unique().references("movements.id");
    t.jsonb("details").notNullable().defaultTo("{}");
    t.index(["drive_id", "recorded_at"]);
    t.index(["group_id", "recorded_by", "recorded_at"]);
  });
  await knex.raw(`alter table movements add constraint movements_kind_check check (kind in (${list(KINDS)}))`);

  await knex.schema.createTable("sorts", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").notNullable().references("drives.id").onDelete("CASCADE");
    t.uuid("movement_id").notNullable().references("movements.id");
    t.integer("good").notNullable();
    t.jsonb("rejected").notNullable().defaultTo("{}");
    t.integer("counted").notNullable();
    t.integer("haul_count").notNullable();
    t.integer("bags").notNullable();
    t.decimal("weight_kg", 10, 3);
    t.timestamp("sorted_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("recorded_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("recorded_by").notNullable().references("users.id");
    t.timestamp("reversed_at", { useTz: true });
    t.index(["drive_id"]);
  });
  await knex.raw("alter table sorts add constraint sorts_counts_check check (good >= 0 and counted >= good and haul_count > 0)");

  await knex.schema.createTable("hauls", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").notNullable().references("drives.id").onDelete("CASCADE");
    t.uuid("drop_point_id").notNullable().references("drop_points.id");
    t.uuid("movement_id").notNullable().references("movements.id");
    t.integer("bags").notNullable();
    t.decimal("weight_kg", 10, 3);
    t.integer("estimated_cans").notNullable();
    t.string("estimate_method", 8).notNullable();
    t.double("estimate_per_unit").notNullable();
    t.integer("estimate_counted_hauls").notNullable().defaultTo(0);
    t.timestamp("hauled_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("recorded_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("recorded_by").notNullable().references("users.id");
    t.uuid("sort_id").references("sorts.id");
    t.timestamp("reversed_at", { useTz: true });
    t.index(["drive_id", "hauled_at"]);
    t.index(["drop_point_id", "hauled_at"]);
  });
  await knex.raw(
    "alter table hauls add constraint hauls_amounts_check check (bags >= 0 and (weight_kg is null or weight_kg >= 0) and estimated_cans >= 0 and (bags > 0 or weight_kg > 0))",
  );

  await knex.schema.createTable("ledger_lines", (t) => {
    t.bigIncrements("id").primary();
    t.uuid("movement_id").notNullable().references("movements.id");
    t.uuid("group_id").notNullable().references("groups.id").onDelete("CASCADE");
    t.uuid("drive_id").notNullable().references("drives.id").onDelete("CASCADE");
    t.uuid("drop_point_id").references("drop_points.id");
    t.uuid("heater_unit_id").references("heater_units.id");
    t.string("from_stage", 12);
    t.string("to_stage", 12);
    t.integer("quantity").notNullable();
    t.string("reason", 16);
    t.boolean("is_estimate").notNullable().defaultTo(false);
    t.text("note").notNullable().defaultTo("");
    t.timestamp("occurred_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("recorded_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.uuid("recorded_by").notNullable().references("users.id");
    t.bigInteger("reverses_id").unique().references("ledger_lines.id");
    t.uuid("haul_id").references("hauls.id");
    t.uuid("sort_id").references("sorts.id");
    t.index(["movement_id"]);
    t.index(["drive_id", "occurred_at"]);
    t.index(["group_id", "recorded_by"]);
    t.index(["drop_point_id"]);
    t.index(["heater_unit_id"]);
  });
  await knex.raw(`
    alter table ledger_lines
      add constraint ledger_lines_quantity_check check (quantity > 0),
      add constraint ledger_lines_from_check check (from_stage is null or from_stage in (${list(STAGES)})),
      add constraint ledger_lines_to_check check (to_stage is null or to_stage in (${list(STAGES)})),
      add constraint ledger_lines_moves_check check ((from_stage is not null or to_stage is not null) and from_stage is distinct from to_stage),
      add constraint ledger_lines_reason_check check (reason is null or reason in (${list(REASONS)}))
  `);
  await knex.raw(`
    create function ledger_lines_append_only() returns trigger language plpgsql as $$
    begin
      raise exception 'ledger_lines is append-only: % refused; record a reversing line instead', tg_op
        using errcode = 'restrict_violation';
    end $$;
    create trigger ledger_lines_no_update before update or delete on ledger_lines
      for each row execute function ledger_lines_append_only();
    create trigger ledger_lines_no_truncate before truncate on ledger_lines
      for each statement execute function ledger_lines_append_only();
    -- "always" so even session_replication_role = replica cannot skip it.
    alter table ledger_lines enable always trigger ledger_lines_no_update;
    alter table ledger_lines enable always trigger ledger_lines_no_truncate;
  `);

  // Running totals. A row with drop_point_id and heater_unit_id both null is the
  // drive's total for that stage; others break the same stage down.
  await knex.raw(`
    create table stage_balances (
      group_id uuid not null references groups(id) on delete cascade,
      drive_id uuid not null references drives(id) on delete cascade,
      drop_point_id uuid references drop_points(id) on delete cascade,
      heater_unit_id uuid references heater_units(id) on delete cascade,
      stage varchar(12) not null check (stage in (${list(STAGES)})),
      quantity bigint not null default 0,
      constraint stage_balances_key unique nulls not distinct (drive_id, drop_point_id, heater_unit_id, stage),
      constraint stage_balances_quantity_check check (quantity >= 0)
    );
    create index stage_balances_heater on stage_balances (heater_unit_id) where heater_unit_id is not null;

    create table reject_tallies (
      group_id uuid not null references groups(id) on delete cascade,
      drive_id uuid not null references drives(id) on delete cascade,
      drop_point_id uuid references drop_points(id) on delete cascade,
      reason varchar(16) not null check (reason in (${list(REASONS)})),
      quantity bigint not null default 0 check (quantity >= 0),
      constraint reject_tallies_key unique nulls not distinct (drive_id, drop_point_id, reason)
    );

    create table drop_point_tallies (
      drop_point_id uuid primary key references drop_points(id) on delete cascade,
      group_id uuid not null references groups(id) on delete cascade,
      drive_id uuid not null references drives(id) on delete cascade,
      hauls integer not null default 0 check (hauls >= 0),
      bags integer not null default 0 check (bags >= 0),
      good_cans bigint not null default 0 check (good_cans >= 0),
      rejected_cans bigint not null default 0 check (rejected_cans >= 0)
    );
    create index drop_point_tallies_drive on drop_point_tallies (drive_id);

    create table drive_daily_good (
      drive_id uuid not null references drives(id) on delete cascade,
      day date not null,
      good_cans bigint not null default 0,
      primary key (drive_id, day)
    );

    create table group_calibration (
      group_id uuid primary key references groups(id) on delete cascade,
      weight_hauls integer not null default 0 check (weight_hauls >= 0),
      weight_cans bigint not null default 0 check (weight_cans >= 0),
      weight_kg numeric(14,3) not null default 0 check (weight_kg >= 0),
      bag_hauls integer not null default 0 check (bag_hauls >= 0),
      bag_cans bigint not null default 0 check (bag_cans >= 0),
      bags bigint not null default 0 check (bags >= 0)
    );

    create table idempotency_keys (
      actor_id uuid not null references users(id) on delete cascade,
      key varchar(200) not null,
      method varchar(8) not null,
      path varchar(400) not null,
      body_hash char(64) not null,
      status integer,
      response jsonb,
      created_at timestamptz not null default now(),
      primary key (actor_id, key)
    );
    create index idempotency_keys_created on idempotency_keys (created_at);
  `);
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["idempotency_keys", "group_calibration", "drive_daily_good", "drop_point_tallies", "reject_tallies", "stage_balances"]) {
    await knex.schema.dropTableIfExists(table);
  }
  await knex.raw("drop table if exists ledger_lines");
  await knex.raw("drop function if exists ledger_lines_append_only()");
  await knex.schema.dropTableIfExists("hauls");
  await knex.schema.dropTableIfExists("sorts");
  await knex.schema.dropTableIfExists("movements");
}
