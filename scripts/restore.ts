import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import path from "node:path";
import { ensurePostgresInstalled } from "./lib/postgres";
import { withDatabase } from "./lib/database-target";

// `npm run restore FILE`: replaces the app's database contents with a backup.
// Stop the app first: restoring under a running app mixes old and new data.
const root = path.resolve(import.meta.dirname, "..");
const file = process.argv[2];
if (!file || !existsSync(file)) {
  console.error("Usage: npm run restore FILE   (a file written by npm run backup)");
  process.exit(2);
}

await withDatabase(root, async (url) => {
  const bin = ensurePostgresInstalled();
  const result = spawnSync(
    path.join(bin, "pg_restore"),
    ["--clean", "--if-exists", "--no-owner", "--single-transaction", "--exit-on-error", "--dbname", url, path.resolve(file)],
    { stdio: "inherit" },
  );
  if (result.status !== 0) throw new Error(`pg_restore failed (exit ${result.status}); the database was left as it was`);
  console.log(`Restored ${file}.`);
});
