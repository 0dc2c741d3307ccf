import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync, chmodSync } from "node:fs";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import pg from "pg";
import { freePort } from "@/tests/support/ports";

// Runs the real start script a second time beside the test stack, with its
// own ports and folders: healthy answer, landing page, clean stop, data kept.
const root = path.resolve(import.meta.dirname, "../..");
const runDir = mkdtempSync(path.join(process.env.CANTROVE_RUN_DIR ?? "/tmp", "start-"));
chmodSync(runDir, 0o755);
const dataDir = path.join(runDir, "pgdata");

async function ports() {
  return { PORT: await freePort(), PGPORT: await freePort(), SMTP_PORT: await freePort(), MAIL_API_PORT: await freePort(), UPLOAD_PORT: await freePort() };
}

function startApp(p: Record<string, number>): { child: ChildProcess; output: () => string } {
  let out = "";
  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: "production", CANTROVE_STATE_DIR: path.join(runDir, "state"), CANTROVE_PGDATA: dataDir };
  delete env.DATABASE_URL;
  for (const [k, v] of Object.entries(p)) env[k] = String(v);
  const child = spawn("node", ["--import", "tsx", "scripts/start.ts"], { cwd: root, env, stdio: ["ignore", "pipe", "pipe"] });
  child.stdout!.on("data", (d) => (out += d));
  child.stderr!.on("data", (d) => (out += d));
  return { child, output: () => out };
}

async function waitFor(check: () => Promise<boolean>, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check().catch(() => false)) return true;
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}

function postgresRunningFor(dir: string): boolean {
  const ps = spawnSync("ps", ["-eo", "args"], { encoding: "utf8" }).stdout;
  return ps.split("\n").some((line) => line.includes("postgres") && line.includes(dir));
}

async function stop(child: ChildProcess) {
  const exited = new Promise<number | null>((r) => child.once("exit", (code) => r(code)));
  child.kill("SIGTERM");
  return exited;
}

afterAll(() => {
  spawnSync("runuser", ["-u", "postgres", "--", "/usr/lib/postgresql/15/bin/pg_ctl", "-D", dataDir, "-m", "immediate", "stop"]);
  rmSync(runDir, { recursive: true, force: true });
});

describe("npm start", () => {
  it("serves health and the landing page, stops the database on SIGTERM, and keeps data on a second start", async () => {
    const p = await ports();
    const first = startApp(p);
    const started = Date.now();
    const healthy = await waitFor(async () => (await fetch(`http://127.0.0.1:${p.PORT}/api/health`)).ok, 90_000);
    expect(healthy, first.output()).toBe(true);
    const coldMs = Date.now() - started;

    expect(await (await fetch(`http://127.0.0.1:${p.PORT}/api/health`)).json()).toEqual({ status: "ok", db: "up" });
    const landing = await (await fetch(`http://127.0.0.1:${p.PORT}/`)).text();
    expect(landing).toContain("Cantrove");
    expect(await waitFor(async () => first.output().includes("organiser@cantrove.test"), 5_000)).toBe(true);

    // A mark of our own, to see that a second start keeps the data.
    const client = new pg.Client({ connectionString: `postgres://postgres@127.0.0.1:${p.PGPORT}/cantrove` });
    await client.connect();
    await client.query("update groups set town = 'Larkhollow (kept)' where slug = 'larkhollow-warm-rooms'");
    await client.end();

    expect(await stop(first.child)).toBe(0);
    expect(postgresRunningFor(dataDir)).toBe(false);

    const second = startApp(p);
    const warmStart = Date.now();
    expect(await waitFor(async () => (await fetch(`http://127.0.0.1:${p.PORT}/api/health`)).ok, 60_000), second.output()).toBe(true);
    const warmMs = Date.now() - warmStart;
    const again = new pg.Client({ connectionString: `postgres://postgres@127.0.0.1:${p.PGPORT}/cantrove` });
    await again.connect();
    const { rows } = await again.query("select town, (select count(*)::int from groups) as groups from groups where slug = 'larkhollow-warm-rooms'");
    await again.end();
    expect(rows[0]).toEqual({ town: "Larkhollow (kept)", groups: 2 });
    expect(second.output()).not.toContain("seeding the demo");

    expect(await stop(second.child)).toBe(0);
    expect(postgresRunningFor(dataDir)).toBe(false);
    console.log(`[measure] npm start on an empty database: ${coldMs} ms to healthy (build reused); warm restart: ${warmMs} ms`);
  }, 240_000);
});
