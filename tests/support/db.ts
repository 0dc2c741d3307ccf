import knex, { type Knex } from "knex";

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
