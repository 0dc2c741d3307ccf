import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, chownSync, chmodSync, rmSync, readdirSync } from "node:fs";
import path from "node:path";
import pg from "pg";

// Debian's PostgreSQL, run as the `postgres` user (it refuses root) with its
// data folder inside the project and listening on loopback only.
const PG_ROOT = "/usr/lib/postgresql";

export function pgBinDir(): string {
  if (existsSync(PG_ROOT)) {
    const versions = readdirSync(PG_ROOT)
      .filter((v) => existsSync(path.join(PG_ROOT, v, "bin", "initdb")))
      .sort((a, b) => Number(b) - Number(a));
    if (versions.length) return path.join(PG_ROOT, versions[0], "bin");
  }
  return "";
}

export function ensurePostgresInstalled(log: (line: string) => void = console.log): string {
  let bin = pgBinDir();
  if (bin) return bin;
  log("PostgreSQL binaries not found: installing Debian's postgresql package…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  execFileSync("apt-get", ["update"], { stdio: "inherit", env });
  execFileSync("apt-get", ["install", "-y", "--no-install-recommends", "postgresql"], { stdio: "inherit", env });
  bin = pgBinDir();
  if (!bin) throw new Error("apt-get finished but no PostgreSQL binaries are in /usr/lib/postgresql/*/bin");
  return bin;
}

export function asPostgres(bin: string, tool: string, args: string[]): void {
  const isRoot = process.getuid?.() === 0;
  const cmd = isRoot ? "runuser" : path.join(bin, tool);
  const fullArgs = isRoot ? ["-u", "postgres", "--", path.join(bin, tool), ...args] : args;
  const result = spawnSync(cmd, fullArgs, { encoding: "utf8" });
  if (result.status !== 0) {
    throw new Error(`${tool} ${args.join(" ")} failed (exit ${result.status}):\n${result.stdout}\n${result.stderr}`);
  }
}

export function ownByPostgres(dir: string): void {
  if (process.getuid?.() !== 0) return;
  const uid = Number(execFileSync("id", ["-u", "postgres"], { encoding: "utf8" }).trim());
  const gid = Number(execFileSync("id", ["-g", "postgres"], { encoding: "utf8" }).trim());
  chownSync(dir, uid, gid);
  chmodSync(dir, 0o700);
}

export interface Cluster {
  dataDir: string;
  port: number;
  url: (database: string) => string;
  stop: () => void;
}

/** Creates the cluster if needed, starts it, and returns how to reach and stop it. */
export function startCluster(dataDir: string, port: number, log: (line: string) => void = console.log): Cluster {
  const bin = ensurePostgresInstalled(log);
  const fresh = !existsSync(path.join(dataDir, "PG_VERSION"));
  if (fresh) {
    mkdirSync(dataDir, { recursive: true });
    ownByPostgres(dataDir);
    if (process.getuid?.() === 0 && spawnSync("runuser", ["-u", "postgres", "--", "test", "-w", dataDir]).status !== 0) {
      throw new Error(
        `PostgreSQL runs as the postgres user, which cannot enter ${dataDir}. Make its parent folders enterable ` +
          `(chmod o+x on each), put the project elsewhere, or set DATABASE_URL to a server of your own.`,
      );
    }
    asPostgres(bin, "initdb", ["-D", dataDir, "-U", "postgres", "--auth=trust", "-E", "UTF8", "--locale=C.UTF-8"]);
  }
  const pidFile = path.join(dataDir, "postmaster.pid");
  if (existsSync(pidFile)) {
    // A previous run that was killed hard may have left a stale pid file.
    const status = spawnSync("runuser", ["-u", "postgres", "--", path.join(bin, "pg_ctl"), "-D", dataDir, "status"]);
    if (status.status !== 0) rmSync(pidFile, { force: true });
    else asPostgres(bin, "pg_ctl", ["-D", dataDir, "-m", "fast", "-w", "stop"]);
  }
  startClusterAt(dataDir, port);
  let stopped = false;
  return {
    dataDir,
    port,
    url: (database) => `postgres://postgres@127.0.0.1:${port}/${database}`,
    stop: () => {
      if (stopped) return;
      stopped = true;
      asPostgres(bin, "pg_ctl", ["-D", dataDir, "-m", "fast", "-w", "-t", "30", "stop"]);
    },
  };
}

export function stopClusterAt(dataDir: string): void {
  const bin = pgBinDir();
  if (!bin || !existsSync(path.join(dataDir, "postmaster.pid"))) return;
  asPostgres(bin, "pg_ctl", ["-D", dataDir, "-m", "fast", "-w", "-t", "30", "stop"]);
}

export function startClusterAt(dataDir: string, port: number): void {
  const bin = pgBinDir();
  asPostgres(bin, "pg_ctl", [
    "-D", dataDir, "-l", path.join(dataDir, "server.log"), "-w", "-t", "30",
    "-o", `-c listen_addresses=127.0.0.1 -p ${port} -c unix_socket_directories='' -c fsync=${process.env.PG_FSYNC ?? "on"}`,
    "start",
  ]);
}

export async function ensureDatabase(adminUrl: string, database: string): Promise<void> {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const found = await client.query("select 1 from pg_database where datname = $1", [database]);
    if (found.rowCount === 0) await client.query(`create database "${database.replace(/"/g, "")}"`);
  } finally {
    await client.end();
  }
}
