import knex, { type Knex } from "knex";
import pg from "pg";
import { afterAll, beforeAll } from "vitest";

// Direct database access for fixtures and assertions in integration tests.
let instance: TestDb | undefined;

/**
 * The app's table reads are typed (types/tables/*.d.ts, which assumes knexfile.ts's
 * type parsers). A test's own connection may run without them (bigint as text) and
 * reads rows it has just written, where a missing row fails the test at its first
 * use, so its table reads stay untyped: this call signature is tried before Knex's.
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- see above: test rows are not the app's row types
export type TestDb = ((table: string) => Knex.QueryBuilder<any, any[]>) & Knex;

export function testDb(): TestDb {
  instance ??= knex({ client: "pg", connection: process.env.DATABASE_URL, pool: { min: 0, max: 4 } }) as TestDb;
  return instance;
}

export async function closeTestDb(): Promise<void> {
  await instance?.destroy();
  instance = undefined;
}

/**
 * Something a whole test file shares: registers a beforeAll that makes it and
 * fills the returned object in (so it can be a const read inside tests and
 * later hooks) and an afterAll that closes the test database's pool.
 */
export function forTheFile<T extends object>(make: () => Promise<T>): T {
  const shared = {} as T;
  beforeAll(async () => {
    Object.assign(shared, await make());
  });
  afterAll(closeTestDb);
  return shared;
}

/** Runs one statement on the test server's `postgres` database (creating or dropping a database of a test's own). */
export async function adminQuery(sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: process.env.DATABASE_URL!.replace(/\/[^/]+$/, "/postgres") });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/** The address of database `name` on the test server. */
export function databaseUrl(name: string): string {
  return process.env.DATABASE_URL!.replace(/\/[^/]+$/, `/${name}`);
}
