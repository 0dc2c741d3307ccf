import { spawn, type ChildProcess } from "node:child_process";
import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import knex from "knex";
import { knexConfig } from "../knexfile";
import { startStack, type Stack } from "./lib/stack";
import { buildIfStale } from "./lib/build";
import { waitForHealthy } from "./lib/wait";
import { balanceErrors, generateDataset } from "./bench/dataset";
import { runLoad, type LoadResult, type LoadTarget } from "./bench/load";
import { measurePage } from "./bench/page";
import { checkTargets, printTable } from "./bench/report";
import { signIn } from "./bench/session";
import { DEMO_PASSWORD } from "../db/seeds/data/scenario";
import { serverCommand, stopServer } from "./lib/serve";

// `npm run bench`: a throwaway PostgreSQL with a big group, the production
// build against it, autocannon over loopback, chromium for the page.
const root = path.resolve(import.meta.dirname, "..");
const env = process.env;
const num = (k: string, d: number) => Number(env[k] ?? d);
const opts = {
  lines: num("BENCH_LINES", 1_000_000),
  hauls: num("BENCH_HAULS", 2_000),
  seconds: num("BENCH_SECONDS", 10),
  warmup: num("BENCH_WARMUP_SECONDS", 2),
  connections: num("BENCH_CONNECTIONS", 16),
  keep: env.BENCH_KEEP === "1",
};
const ports = { app: num("BENCH_PORT", 4106), pg: num("BENCH_PGPORT", 25506), smtp: num("BENCH_SMTP_PORT", 2706), mailApi: num("BENCH_MAIL_API_PORT", 8206), upload: num("BENCH_UPLOAD_PORT", 8256) };
const dir = path.join(root, ".bench");
const log = (s: string) => console.log(`[bench] ${s}`);

let stack: Stack | null = null;
let server: ChildProcess | null = null;

async function main() {
  const started = Date.now();
  if (!opts.keep) rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  stack = await startStack({
    root, stateDir: path.join(dir, "state"), pgDataDir: path.join(dir, "pgdata"), pgPort: ports.pg, databaseName: "cantrove_bench",
    smtpPort: ports.smtp, mailApiPort: ports.mailApi, uploadPort: ports.upload, appPort: ports.app, seed: "demo", log,
  });
  const db = knex(knexConfig(stack.env.DATABASE_URL));
  let t = Date.now();
  log(`Generating ${opts.lines.toLocaleString("en")} ledger lines and ${opts.hauls} hauls…`);
  const data = await generateDataset(db, { lines: opts.lines, hauls: opts.hauls, drives: 3, pointsPerDrive: 20 });
  const datasetSeconds = (Date.now() - t) / 1000;
  log(`Dataset ready: ${data.lines.toLocaleString("en")} lines in ${datasetSeconds.toFixed(1)} s.`);
  const before = await balanceErrors(db, data.driveIds);
  if (before.length) throw new Error(`Generated totals disagree with the ledger: ${JSON.stringify(before.slice(0, 3))}`);

  const serverEnv = { ...process.env, ...stack.env, NODE_ENV: "production" as const, CANTROVE_BENCH: "1" };
  t = Date.now();
  buildIfStale(root, serverEnv, log);
  const buildSeconds = (Date.now() - t) / 1000;
  server = spawn(...serverCommand(root, ports.app), { cwd: root, env: serverEnv, stdio: ["ignore", "ignore", "inherit"] });
  const base = `http://127.0.0.1:${ports.app}`;
  await waitForHealthy(`${base}/api/health`, 60_000);
  const cookie = await signIn(base, "organiser@cantrove.test", DEMO_PASSWORD);

  const [driveId] = data.driveIds;
  const [slug] = data.slugs;
  const auth = { cookie };
  const stock = await (await fetch(`${base}/api/drives/${driveId}/stock`, { headers: auth })).json();
  const naive = await (await fetch(`${base}/api/bench/naive-stock/${driveId}`, { headers: auth })).json();
  if (JSON.stringify(stock.stages) !== JSON.stringify(naive.stages)) throw new Error(`Stock and the naive sum disagree: ${JSON.stringify({ stock: stock.stages, naive: naive.stages })}`);
  const points = await (await fetch(`${base}/api/public/drives/${slug}/drop-points`)).json();
  log(`Drive 1: ${points.length} drop points; good ${stock.stages.good}, washed ${stock.stages.washed}, punched ${stock.stages.punched}.`);

  const targets: LoadTarget[] = [
    { name: "floor: GET /api/health (select 1)", method: "GET", path: "/api/health" },
    { name: "GET public drop-points + tallies", method: "GET", path: `/api/public/drives/${slug}/drop-points` },
    { name: "GET stock (signed in)", method: "GET", path: `/api/drives/${driveId}/stock`, headers: auth },
    { name: "POST processing (Idempotency-Key)", method: "POST", path: `/api/drives/${driveId}/processing`, headers: auth, body: JSON.stringify({ from: "good", to: "washed", quantity: 1 }), uniqueKey: true },
    { name: "naive: stock summed from ledger", method: "GET", path: `/api/bench/naive-stock/${driveId}`, headers: auth },
  ];
  // A fresh server is still compiling and loading modules: warm every endpoint once before measuring any
  // (not the naive one: its slow queries would still be running in PostgreSQL during the next measurement).
  log(`Warming up the endpoints (${opts.warmup} s each)…`);
  for (const target of targets.filter((t) => !t.name.startsWith("naive"))) {
    if (opts.warmup > 0) await runLoad(base, target, { connections: opts.connections, seconds: opts.warmup });
  }
  const results: LoadResult[] = [];
  for (const target of targets) {
    if (opts.warmup > 0) await runLoad(base, target, { connections: opts.connections, seconds: opts.warmup });
    const r = await runLoad(base, target, { connections: opts.connections, seconds: opts.seconds });
    log(`${r.name}: ${r.rps} req/s, p50 ${r.p50} ms, p95 ${r.p95} ms, p99 ${r.p99} ms, statuses ${JSON.stringify(r.statuses)}`);
    results.push(r);
  }
  const after = await balanceErrors(db, data.driveIds);
  const processed = await db("ledger_lines").where({ drive_id: driveId }).whereRaw("recorded_at > now() - interval '1 hour'").count({ n: "*" }).first();
  await db.destroy();

  log(`Measuring /drives/${slug} in headless chromium…`);
  const page = await measurePage(`${base}/drives/${slug}`);

  const report = checkTargets(results, page, { balanceErrors: after });
  printTable(results, report);
  const out = {
    when: new Date().toISOString(),
    machine: { cpus: os.cpus().length, loadAverage: os.loadavg().map((x) => Math.round(x * 10) / 10), cpuModel: os.cpus()[0]?.model, memoryGb: Math.round(os.totalmem() / 2 ** 30), node: process.version },
    settings: { ...opts, keep: undefined, dbPoolMax: Number(env.DB_POOL_MAX ?? 10) },
    dataset: { ...data, hauls: opts.hauls, drives: 3, dropPoints: 60, generatedSeconds: datasetSeconds },
    buildSeconds,
    endpoints: results.map((r) => ({ ...r, ...report.ratios[r.name] })),
    writes: { processingLinesWritten: Number(processed?.n ?? 0), balanceErrors: after },
    page,
    targets: report.targets,
    allTargetsMet: report.targets.every((x) => x.met),
    totalSeconds: Math.round((Date.now() - started) / 1000),
  };
  mkdirSync(path.join(root, "bench"), { recursive: true });
  writeFileSync(path.join(root, "bench/results.json"), JSON.stringify(out, null, 2) + "\n");
  log(`Wrote bench/results.json (total ${out.totalSeconds} s).`);
  return out.allTargetsMet ? 0 : 1;
}

async function cleanup() {
  await stopServer(server);
  await stack?.stop().catch((e) => console.error("stop failed:", e));
  if (!opts.keep) rmSync(dir, { recursive: true, force: true });
}

let code = 1;
for (const signal of ["SIGINT", "SIGTERM"] as const) process.once(signal, () => void cleanup().then(() => process.exit(130)));
try {
  code = await main();
} catch (error) {
  console.error(`[bench] failed: ${(error as Error).stack ?? error}`);
} finally {
  await cleanup();
}
process.exit(code);
