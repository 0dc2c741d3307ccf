import type { Knex } from "knex";

// Many groups (issue 18): a drive belongs to one group and a drop point to one
// drive, but the planner takes "group_id = ? and drive_id = ?" as two
// independent filters and, with 1,000 groups, expects a few rows where a
// drive has thousands — then it reads the whole drive and sorts it for a page
// of 50 (a small group's ledger page: 237 ms on the bench's 10 million lines;
// 0.5 ms once it knows). Extended statistics (functional dependencies) tell
// it; ANALYZE fills them in.
//
// The organiser's ledger list filters by group and drive and pages by
// (occurred_at, id): one index with all four answers the page in order and
// counts the drive's lines from the index alone (an index-only scan; the old
// (drive_id, occurred_at, id) index had to visit every line's table row for
// group_id). It replaces that index, which no query without a group used.
// Built CONCURRENTLY (outside a transaction), so writes go on meanwhile.
export const config = { transaction: false };

const STATS: [string, string, string][] = [
  ["ledger_lines_tenancy_stats", "ledger_lines", "group_id, drive_id, drop_point_id"],
  ["movements_tenancy_stats", "movements", "group_id, drive_id"],
  ["hauls_tenancy_stats", "hauls", "group_id, drive_id, drop_point_id"],
  ["drop_points_tenancy_stats", "drop_points", "group_id, drive_id"],
  ["stage_balances_tenancy_stats", "stage_balances", "group_id, drive_id"],
];

export async function up(knex: Knex): Promise<void> {
  for (const [name, table, columns] of STATS) await knex.raw(`create statistics if not exists ${name} (dependencies) on ${columns} from ${table}`);
  await knex.raw("create index concurrently if not exists ledger_lines_group_drive_occurred on ledger_lines (group_id, drive_id, occurred_at desc, id desc)");
  await knex.raw("drop index concurrently if exists ledger_lines_drive_occurred");
  for (const table of new Set(STATS.map(([, t]) => t))) await knex.raw(`analyze ${table}`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("create index concurrently if not exists ledger_lines_drive_occurred on ledger_lines (drive_id, occurred_at desc, id desc)");
  await knex.raw("drop index concurrently if exists ledger_lines_group_drive_occurred");
  for (const [name] of STATS) await knex.raw(`drop statistics if exists ${name}`);
}
