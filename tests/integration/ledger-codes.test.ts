import { afterAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "@/tests/support/db";
import { LINE_REASONS, MOVEMENT_KINDS, STAGES, TALLY_REASONS } from "@/lib/ledger/schemas";

// The TypeScript lists in lib/ledger/schemas.ts are the one source of the
// ledger's codes; the database's CHECK constraints must allow exactly them.
afterAll(closeTestDb);

/** The quoted values of a CHECK constraint's IN list, as PostgreSQL prints it back. */
async function allowed(table: string, constraint: string): Promise<string[]> {
  const { rows } = await testDb().raw(
    `select pg_get_constraintdef(c.oid) as def from pg_constraint c
     where c.conrelid = ?::regclass and c.conname = ? and c.contype = 'c'`,
    [table, constraint],
  );
  expect(rows, `${table}.${constraint} exists`).toHaveLength(1);
  return [...(rows[0].def as string).matchAll(/'([^']*)'/g)].map((m) => m[1]).sort();
}

/** The CHECK on a column, found by the column it names, for tables whose checks carry generated names. */
async function columnCheck(table: string, column: string): Promise<string> {
  const { rows } = await testDb().raw(
    `select c.conname from pg_constraint c
     join pg_attribute a on a.attrelid = c.conrelid and a.attnum = any (c.conkey)
     where c.conrelid = ?::regclass and c.contype = 'c' and a.attname = ? and pg_get_constraintdef(c.oid) like '%ARRAY[%'`,
    [table, column],
  );
  expect(rows, `one list check on ${table}.${column}`).toHaveLength(1);
  return rows[0].conname as string;
}

const sorted = (values: readonly string[]) => [...values].sort();

describe("the database's checks and the TypeScript lists", () => {
  it("allow exactly the stages", async () => {
    expect(await allowed("ledger_lines", "ledger_lines_from_check")).toEqual(sorted(STAGES));
    expect(await allowed("ledger_lines", "ledger_lines_to_check")).toEqual(sorted(STAGES));
    expect(await allowed("stage_balances", await columnCheck("stage_balances", "stage"))).toEqual(sorted(STAGES));
  });

  it("allow exactly the reasons", async () => {
    expect(await allowed("ledger_lines", "ledger_lines_reason_check")).toEqual(sorted(LINE_REASONS));
    expect(await allowed("reject_tallies", "reject_tallies_reason_check")).toEqual(sorted(TALLY_REASONS));
  });

  it("allow exactly the movement kinds", async () => {
    expect(await allowed("movements", "movements_kind_check")).toEqual(sorted(MOVEMENT_KINDS));
  });
});
