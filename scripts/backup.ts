import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, statSync } from "node:fs";
import path from "node:path";
import { ensurePostgresInstalled } from "./lib/postgres";
import { withDatabase } from "./lib/database-target";

// `npm run backup [FILE]`: a pg_dump (custom format) of the app's database.
const root = path.resolve(import.meta.dirname, "..");
const stamp = new Date().toISOString().replace(/[:.]/g, "-");
const file = path.resolve(process.argv[2] ?? path.join(root, "backups", `cantrove-${stamp}.dump`));

await withDatabase(root, async (url) => {
  const bin = ensurePostgresInstalled();
  mkdirSync(path.dirname(file), { recursive: true });
  const result = spawnSync(path.join(bin, "pg_dump"), ["--format=custom", "--no-owner", "--file", file, url], { stdio: "inherit" });
  if (result.status !== 0 || !existsSync(file)) throw new Error(`pg_dump failed (exit ${result.status})`);
  console.log(`Backup written to ${file} (${(statSync(file).size / 1024).toFixed(0)} kB).`);
});
