import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import path from "node:path";
import pg from "pg";
import knex from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { knexConfig } from "@/knexfile";
import { adminQuery, databaseUrl } from "@/tests/support/db";

// npm run backup, then npm run restore into a fresh database: every table's
// rows must come back identical (ledger lines and running totals included).
const root = path.resolve(import.meta.dirname, "../..");
const dir = mkdtempSync(path.join(process.env.CANTROVE_RUN_DIR ?? "/tmp", "backup-"));
// A database of its own (migrated and seeded here), so tests writing to the
// shared test database in parallel cannot change it between dump and compare.
const sourceName = `backup_src_${Date.now()}`;
const targetName = `restore_${Date.now()}`;
const source = databaseUrl(sourceName);
const target = databaseUrl(targetName);

beforeAll(async () => {
  await adminQuery(`create database "${sourceName}"`);
  const db = knex(knexConfig(source));
  try {
    await db.migrate.latest({ directory: path.join(root, "db/migrations") });
    await db.seed.run({ directory: path.join(root, "db/seeds") });
  } finally {
    await db.destroy();
  }
}, 60_000);

async function tableDigests(url: string): Promise<Record<string, string>> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const tables = await client.query(
      "select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' and table_name not like 'knex_%' order by 1",
    );
    const out: Record<string, string> = {};
    for (const { table_name: t } of tables.rows) {
      const { rows } = await client.query(
        `select count(*)::int as n, coalesce(md5(string_agg(r::text, '|' order by r::text)), '') as h from "${t}" r`,
      );
      out[t] = `${rows[0].n}:${rows[0].h}`;
    }
    return out;
  } finally {
    await client.end();
  }
}

afterAll(async () => {
  await adminQuery(`drop database if exists "${targetName}"`);
  await adminQuery(`drop database if exists "${sourceName}"`);
  rmSync(dir, { recursive: true, force: true });
});

describe("backup and restore", () => {
  it("restores every row of every table into a fresh database", async () => {
    const file = path.join(dir, "cantrove.dump");
    const env = { ...process.env, NODE_OPTIONS: "" };
    const backup = spawnSync("node", ["--import", "tsx", "scripts/backup.ts", file], {
      cwd: root,
      env: { ...env, DATABASE_URL: source },
      encoding: "utf8",
    });
    expect(backup.status, backup.stderr).toBe(0);

    await adminQuery(`create database "${targetName}"`);

    const restore = spawnSync("node", ["--import", "tsx", "scripts/restore.ts", file], {
      cwd: root,
      env: { ...env, DATABASE_URL: target },
      encoding: "utf8",
    });
    expect(restore.status, restore.stderr).toBe(0);

    const before = await tableDigests(source);
    const after = await tableDigests(target);
    expect(Object.keys(before).length).toBeGreaterThan(5);
    expect(after).toEqual(before);
  }, 60_000);
});
