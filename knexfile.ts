import type { Knex } from "knex";
import pg from "pg";

// Rows come back in the types the code means, for every Knex instance (the
// app's, the CLI's, the tests'): bigint counts and sums and numeric weights as
// numbers (no ledger total comes near 2^53), calendar dates as "YYYY-MM-DD"
// text, never a Date at the server's local midnight.
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.DATE, (v) => v);

// Used by the knex CLI, the start script and the tests. The app itself builds
// its one instance in lib/db.ts from the same settings.
export function knexConfig(url = process.env.DATABASE_URL): Knex.Config {
  return {
    client: "pg",
    connection: url,
    pool: { min: 0, max: Number(process.env.DB_POOL_MAX ?? 10) },
    acquireConnectionTimeout: 5_000,
    migrations: {
      directory: "./db/migrations",
      extension: "ts",
      loadExtensions: [".ts"],
      tableName: "knex_migrations",
    },
    seeds: { directory: "./db/seeds", extension: "ts", loadExtensions: [".ts"] },
  };
}

// The CLI reads the default export; a missing DATABASE_URL fails at the first
// query with pg's own message rather than at import time (next build imports this).
export default knexConfig();
