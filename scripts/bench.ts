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
import { generateOtherGroups, type OtherGroups } from "./bench/groups";
import { compare, printComparison, startAppServer, startBalancer, type Comparison } from "./bench/compare";
import { ensureClusterTools } from "./lib/cluster";
import { LEDGER_SCREEN_PAGE } from "../lib/ledger/ledger-page";

// `npm run bench`: a throwaway PostgreSQL with a big group, the production
// build against it, autocannon over loopback, chromium for the page; then
// 1 vs 2 app servers behind HAProxy (BENCH_SERVERS=1 skips it) and, with
// `npm run bench -- --groups` (or BENCH_GROUPS=1000), 1 vs 1,000 groups: a copy
// of the database with 999 more groups (10 million ledger lines in all),
// measured side by side with the one-group database (scripts/bench/compare.ts).
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
  groups: process.argv.includes("--groups") ? 1_000 : num("BENCH_GROUPS", 1),
  /** Ledger lines in all when there are many groups: the busy group's `lines`, the rest shared by the others. */
  totalLines: num("BENCH_TOTAL_LINES", 10_000_000),
  servers: num("BENCH_SERVERS", 2),
  compareRounds: num("BENCH_COMPARE_ROUNDS", 6),
  /** One run of a round (a round is four: A B B A). */
  compareSeconds: num("BENCH_COMPARE_SECONDS", 2),
};
const ports = { app: num("BENCH_PORT", 4106), pg: num("BENCH_PGPORT", 25506), smtp: num("BENCH_SMTP_PORT", 2706), mailApi: num("BENCH_MAIL_API_PORT", 8206), upload: num("BENCH_UPLOAD_PORT", 8256) };
const dir = path.join(root, ".bench");
const log = (s: string) => console.log(`[bench] ${s}`);

let stack: Stack | null = null;
let server: ChildProcess | null = null;
const extra: ChildProcess[] = [];

async function main() {
  const started = Date.now();
  if (!opts.keep) rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  stack = await startStack({
    root, stateDir: path.join(dir, "state"), pgDataDir: path.join(dir, "pgdata"), pgPort: ports.pg, databaseName: "cantrove_bench",
    smtpPort: ports.smtp, mailApiPort: ports.mailApi, uploadPort: ports.upload, appPort: ports.app, seed: "demo", log,
  });
  let db = knex(knexConfig(stack.env.DATABASE_URL));
  let t = Date.now();
  log(`Generating ${opts.lines.toLocaleString("en")} ledger lines and ${opts.hauls} hauls…`);
  const data = await generateDataset(db, { lines: opts.lines, hauls: opts.hauls, drives: 3, pointsPerDrive: 20 });
  const datasetSeconds = (Date.now() - t) / 1000;
  log(`Dataset ready: ${data.lines.toLocaleString("en")} lines in ${datasetSeconds.toFixed(1)} s.`);
  const before = await balanceErrors(db, data.driveIds);
  if (before.length) throw new Error(`Generated totals disagree with the ledger: ${JSON.stringify(before.slice(0, 3))}`);

  // Many groups: the one-group database copied (CREATE DATABASE … TEMPLATE), then 999 more groups written into the copy.
  let many: (OtherGroups & { databaseUrl: string; totalLines: number; generatedSeconds: number; databaseBytes: number }) | null = null;
  if (opts.groups > 1) {
    await db.destroy(); // a template must have no other session
    const manyName = "cantrove_bench_many";
    const admin = knex(knexConfig(stack.cluster!.url("postgres")));
    const exists = (await admin.raw("select 1 from pg_database where datname = ?", [manyName])).rows.length > 0;
    if (!exists) await admin.raw(`create database ${manyName} template cantrove_bench`);
    await admin.destroy();
    db = knex(knexConfig(stack.env.DATABASE_URL));
    const databaseUrl = stack.cluster!.url(manyName);
    const mdb = knex(knexConfig(databaseUrl));
    // The bench's own throwaway cluster: fewer checkpoints (and full-page images after each) while nine million rows go in.
    for (const setting of ["max_wal_size = '4GB'", "wal_compression = on"]) await db.raw(`alter system set ${setting}`);
    await db.raw("select pg_reload_conf()");
    const others = opts.groups - 1;
    const linesPerGroup = Math.ceil(Math.max(0, opts.totalLines - data.lines) / others);
    t = Date.now();
    log(`Writing ${others} more groups (${linesPerGroup.toLocaleString("en")} ledger lines each) into a copy of the database…`);
    const g = await generateOtherGroups(mdb, { groups: others, linesPerGroup, hauls: 30, pointsPerDrive: 5, log });
    const generatedSeconds = (Date.now() - t) / 1000;
    const total = await mdb.raw("select count(*)::bigint as n, pg_database_size(current_database()) as bytes from ledger_lines");
    const otherIds = (await mdb("drives").where("slug", "like", "bench-group-%").select("id")).map((r) => r.id);
    const wrong = await balanceErrors(mdb, [...data.driveIds, ...otherIds]);
    await mdb.destroy();
    if (wrong.length) throw new Error(`Generated totals of the many-group database disagree with the ledger: ${JSON.stringify(wrong.slice(0, 3))}`);
    many = { ...g, databaseUrl, totalLines: Number(total.rows[0].n), databaseBytes: Number(total.rows[0].bytes), generatedSeconds };
    log(`${opts.groups} groups: ${many.totalLines.toLocaleString("en")} ledger lines in all, database ${(many.databaseBytes / 2 ** 30).toFixed(1)} GiB, written in ${generatedSeconds.toFixed(0)} s.`);
  }

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

  // The endpoints compared side by side: what a crowd on a shared drive and its organiser hit.
  const sideTargets = (cookie: string): LoadTarget[] => [
    { name: "floor: GET /api/health (select 1)", method: "GET", path: "/api/health" },
    { name: "GET public drive (progress)", method: "GET", path: `/api/public/drives/${slug}` },
    { name: "GET public drive page (HTML)", method: "GET", path: `/drives/${slug}` },
    { name: "GET public drop-points + tallies", method: "GET", path: `/api/public/drives/${slug}/drop-points` },
    { name: "GET stock (signed in)", method: "GET", path: `/api/drives/${driveId}/stock`, headers: { cookie } },
    // As the ledger screen asks for it: a screen's worth of lines and the bounded count.
    { name: "GET ledger list, first page", method: "GET", path: `/api/ledger?driveId=${driveId}&limit=${LEDGER_SCREEN_PAGE}`, headers: { cookie } },
  ];
  const cmp = { rounds: opts.compareRounds, seconds: opts.compareSeconds, warmup: 2, connections: opts.connections, log };
  let servers: Comparison | null = null;
  if (opts.servers >= 2) {
    ensureClusterTools(log);
    log("1 vs 2 app servers: a second server on the same database, HAProxy in front of one and of both…");
    extra.push(await startAppServer(root, ports.app + 1, serverEnv, log));
    const lb = { one: ports.app + 2, two: ports.app + 3 };
    extra.push(startBalancer(dir, { ...lb, apps: [ports.app, ports.app + 1] }, log));
    await waitForHealthy(`http://127.0.0.1:${lb.one}/api/health`, 15_000);
    await waitForHealthy(`http://127.0.0.1:${lb.two}/api/health`, 15_000);
    servers = await compare(
      { label: "1 server", base: `http://127.0.0.1:${lb.one}`, targets: sideTargets(cookie) },
      { label: "2 servers", base: `http://127.0.0.1:${lb.two}`, targets: sideTargets(cookie) },
      { ...cmp, settle: () => settleDatabases([stack!.env.DATABASE_URL]) },
    );
    while (extra.length) await stopServer(extra.pop()!, 5_000, true);
  }
  let groups: Comparison | null = null;
  if (many) {
    // No read cache on either side (READ_CACHE_MS=0): every request reaches PostgreSQL, so the comparison is of the queries, not of the cache.
    log(`1 vs ${opts.groups} groups: two servers without read cache, one on each database…`);
    await stopServer(server);
    server = null;
    const noCache = { ...serverEnv, READ_CACHE_MS: "0" };
    extra.push(await startAppServer(root, ports.app + 1, noCache, log));
    extra.push(await startAppServer(root, ports.app + 4, { ...noCache, DATABASE_URL: many.databaseUrl }, log));
    const [oneBase, manyBase] = [`http://127.0.0.1:${ports.app + 1}`, `http://127.0.0.1:${ports.app + 4}`];
    const [oneCookie, manyCookie] = [await signIn(oneBase, "organiser@cantrove.test", DEMO_PASSWORD), await signIn(manyBase, "organiser@cantrove.test", DEMO_PASSWORD)];
    // Both databases in the same state before the first run: the one-group database has just taken the
    // processing writes (dead row versions in the running totals), the other was written long before.
    groups = await compare(
      { label: "1 group", base: oneBase, targets: sideTargets(oneCookie) },
      { label: `${opts.groups} groups`, base: manyBase, targets: sideTargets(manyCookie) },
      { ...cmp, settle: () => settleDatabases([stack!.env.DATABASE_URL, many!.databaseUrl]) },
    );
    while (extra.length) await stopServer(extra.pop()!, 5_000, true);
  }
  if (servers) printComparison(servers);
  if (groups) printComparison(groups);
  const ratioOf = (c: Comparison, name: string) => c.endpoints.find((e) => e.name === name)!;
  if (groups) {
    for (const name of ["GET public drive (progress)", "GET public drive page (HTML)", "GET stock (signed in)"]) {
      const e = ratioOf(groups, name);
      report.targets.push({ name: `${name}: ${opts.groups} groups vs 1`, limit: ">= 0.9", measured: `${e.ratio} (rounds ${e.spread[0]}–${e.spread[1]}; ÷ floor ${e.ratioVsFloor})`, met: e.ratio >= 0.9 && e.b.non2xx === 0 });
    }
  }
  if (groups) for (const t of report.targets.slice(-3)) console.log(`${t.met ? "MET    " : "NOT MET"}  ${t.name}: ${t.measured} (target ${t.limit})`);
  console.log("");
  const out = {
    when: new Date().toISOString(),
    machine: { cpus: os.cpus().length, loadAverage: os.loadavg().map((x) => Math.round(x * 10) / 10), cpuModel: os.cpus()[0]?.model, memoryGb: Math.round(os.totalmem() / 2 ** 30), node: process.version },
    settings: { ...opts, keep: undefined, dbPoolMax: Number(env.DB_POOL_MAX ?? 10) },
    dataset: { ...data, hauls: opts.hauls, drives: 3, dropPoints: 60, generatedSeconds: datasetSeconds },
    manyGroups: many && { groups: opts.groups, ledgerLines: many.totalLines, otherGroupsLines: many.lines, databaseGiB: Math.round((many.databaseBytes / 2 ** 30) * 10) / 10, generatedSeconds: many.generatedSeconds },
    comparisons: { servers, groups },
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

/**
 * The compared databases brought to the same state, so neither side pays for
 * the other's housekeeping: VACUUM ANALYZE each (dead row versions gone,
 * visibility maps set for index-only scans, fresh statistics), one CHECKPOINT
 * (no flush of the writes' dirty pages during a run), then a wait of up to
 * two minutes for any autovacuum worker still running.
 */
async function settleDatabases(urls: string[]) {
  const t = Date.now();
  for (const url of urls) {
    const sdb = knex(knexConfig(url));
    try {
      await sdb.raw("vacuum analyze");
    } finally {
      await sdb.destroy();
    }
  }
  const admin = knex(knexConfig(stack!.cluster!.url("postgres")));
  try {
    await admin.raw("checkpoint");
    for (let waited = 0; waited < 120_000; waited += 1_000) {
      const busy = Number((await admin.raw("select count(*) as n from pg_stat_activity where backend_type = 'autovacuum worker'")).rows[0].n);
      if (busy === 0) break;
      await new Promise((r) => setTimeout(r, 1_000));
    }
  } finally {
    await admin.destroy();
  }
  log(`Databases settled (VACUUM ANALYZE, CHECKPOINT, no autovacuum running) in ${((Date.now() - t) / 1000).toFixed(0)} s.`);
}

async function cleanup() {
  for (const child of extra) await stopServer(child, 5_000, true);
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
