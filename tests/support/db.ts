import knex, { type Knex } from "knex";
import { afterAll, beforeAll } from "vitest";

// Direct database access for fixtures and assertions in integration tests.
let instance: Knex | undefined;

export function testDb(): Knex {
  instance ??= knex({ client: "pg", connection: process.env.DATABASE_URL, pool: { min: 0, max: 4 } });
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
