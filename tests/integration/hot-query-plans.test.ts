import { writeFileSync } from "node:fs";
import path from "node:path";
import pg from "pg";
import knex, { type Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { knexConfig } from "@/knexfile";
import { adminQuery, databaseUrl } from "@/tests/support/db";
import { generateDataset } from "@/scripts/bench/dataset";
import { generateOtherGroups } from "@/scripts/bench/groups";
import { LEDGER_COUNT_CAP } from "@/lib/ledger/ledger-page";

// Every group-filtered hot query, EXPLAINed exactly as the app sends it: the
// real query functions run against a database of their own with many groups
// (a busy one with a tenth of the ledger, 200 small ones: the bench's shape,
// scripts/bench/groups.ts, at a thirtieth of its size) while Knex's "query"
// event records their SQL and bindings; each recorded statement is then
// EXPLAINed with its own bindings (the plan PostgreSQL makes for those values).
// Two checks, for the busy group and for a small one:
//  1. as the planner chooses with the table statistics (run with EXPLAIN
//     ANALYZE): no sequential scan (nor an index read end to end) of a table
//     holding 10,000 rows or more, and for a page (LIMIT) no sort of more than
//     1,000 of its rows (without 20261213010000_group_drive_plans a small
//     group's ledger page sorted all of its drive's lines);
//  2. with enable_seqscan = off: no sequential scan of any table at all, which
//     shows an index serves every filter (a table small here may hold a
//     hundred times more rows in a hosted Cantrove).
// 3. the ledger list's pages (issue 18) read a bounded number of ledger lines,
//    whatever the group's size: keyset paging in the index's order, and a
//    count that stops at LEDGER_COUNT_CAP (an exact count read every line of
//    a busy drive on every view).
// The plans are written down in DEVELOPERS.md ("Plans of the hot queries").
// HOT_PLANS_URL runs the same checks against a database already generated
// (the bench's 1,000 groups: `BENCH_KEEP=1 npm run bench -- --groups`, then
// its cantrove_bench_many); HOT_PLANS_OUT writes every plan to that file.
const root = path.resolve(import.meta.dirname, "../..");
const given = process.env.HOT_PLANS_URL;
const name = `plans_${Date.now()}`;
const url = given ?? databaseUrl(name);
const dump: { who: string; label: string; sql: string; plan: string }[] = [];
const BIG_ROWS = 10_000;

type Recorded = { sql: string; bindings: unknown[] };
type PlanNode = {
  "Node Type": string;
  "Relation Name"?: string;
  "Index Name"?: string;
  "Index Cond"?: string;
  "Actual Rows"?: number;
  "Actual Loops"?: number;
  Plans?: PlanNode[];
};
type Lib = Awaited<ReturnType<typeof loadLib>>;

const saved = { DATABASE_URL: process.env.DATABASE_URL, READ_CACHE_MS: process.env.READ_CACHE_MS, DATABASE_READ_URL: process.env.DATABASE_READ_URL };
let appDb: Knex;
let lib: Lib;
let client: pg.Client;
let rows: Record<string, number> = {};
const ids = { busy: { group: "", drive: "", slug: "", point: "", middle: "", lines: 0 }, small: { group: "", drive: "", slug: "", point: "", middle: "", lines: 0 } };

/** The app's query modules, loaded against the plans database (lib/db.ts builds its one Knex from DATABASE_URL on first import). */
async function loadLib() {
  process.env.DATABASE_URL = url;
  process.env.READ_CACHE_MS = "0"; // every call reaches PostgreSQL
  delete process.env.DATABASE_READ_URL;
  delete (globalThis as { cantroveDb?: Knex }).cantroveDb;
  const [dbm, pub, balances, ledgerList, ledger, search, drives, fill, dashboard, auth, service] = await Promise.all([
    import("@/lib/db"),
    import("@/lib/drives/public-queries"),
    import("@/lib/ledger/balances"),
    import("@/lib/ledger/ledger-list"),
    import("@/lib/ledger/queries"),
    import("@/lib/search/queries"),
    import("@/lib/drives/queries"),
    import("@/lib/drives/fill-queries"),
    import("@/lib/drives/dashboard"),
    import("@/lib/auth/queries"),
    import("@/lib/drives/public-service"),
  ]);
  return { db: dbm.db, pub, balances, ledgerList, ledger, search, drives, fill, dashboard, auth, service };
}

beforeAll(async () => {
  if (!given) await adminQuery(`create database "${name}"`);
  const db = knex(knexConfig(url));
  try {
    if (!given) {
      await db.migrate.latest({ directory: path.join(root, "db/migrations") });
      await db.seed.run({ directory: path.join(root, "db/seeds") });
      await generateDataset(db, { lines: 30_000, hauls: 300, drives: 3, pointsPerDrive: 20 });
      await generateOtherGroups(db, { groups: 200, linesPerGroup: 1_350, hauls: 30, pointsPerDrive: 5, chunk: 100 });
    }
    const drive = async (slug: string) => {
      const { rows: found } = await db.raw(`select d.id, d.group_id, d.slug, (select p.id from drop_points p where p.drive_id = d.id order by p.name limit 1) as point from drives d where d.slug = ?`, [slug]);
      if (!found[0]) throw new Error(`the plans database has no drive ${slug}`);
      // A line halfway down the drive's list: the cursor of a later page.
      const lines = Number((await db("ledger_lines").where({ drive_id: found[0].id }).count({ n: "*" }))[0].n);
      const middle = await db("ledger_lines").where({ drive_id: found[0].id }).orderBy([{ column: "occurred_at", order: "desc" }, { column: "id", order: "desc" }]).offset(Math.floor(lines / 2)).first("id");
      return { group: found[0].group_id as string, drive: found[0].id as string, slug, point: found[0].point as string, middle: String(middle?.id ?? ""), lines };
    };
    ids.busy = await drive("bench-drive-1");
    ids.small = await drive("bench-group-7-drive");
    const counts = await db.raw(`select relname, reltuples::bigint as n from pg_class where relkind = 'r' and relnamespace = 'public'::regnamespace`);
    rows = Object.fromEntries(counts.rows.map((r: { relname: string; n: number }) => [r.relname, Number(r.n)]));
  } finally {
    await db.destroy();
  }
  lib = await loadLib();
  appDb = lib.db;
  client = new pg.Client({ connectionString: url });
  await client.connect();
}, 300_000);

afterAll(async () => {
  await client?.end();
  await appDb?.destroy();
  for (const [k, v] of Object.entries(saved)) if (v === undefined) delete process.env[k];
  else process.env[k] = v;
  if (!given) await adminQuery(`drop database if exists "${name}" with (force)`);
  if (process.env.HOT_PLANS_OUT) writeFileSync(process.env.HOT_PLANS_OUT, dump.map((d) => `## ${d.who}: ${d.label}\n${d.sql}\n${d.plan}\n`).join("\n"));
}, 60_000);

/** The statements a call sends, recorded from Knex's "query" event. */
async function recorded(run: () => Promise<unknown>): Promise<Recorded[]> {
  const out: Recorded[] = [];
  const listen = (q: { sql: string; bindings?: unknown[] }) => out.push({ sql: q.sql, bindings: q.bindings ?? [] });
  appDb.on("query", listen);
  try {
    await run();
  } finally {
    appDb.removeListener("query", listen);
  }
  return out;
}

function scans(node: PlanNode, out: { type: string; relation?: string; index?: string; cond?: string }[] = []) {
  if (/Scan/.test(node["Node Type"])) out.push({ type: node["Node Type"], relation: node["Relation Name"], index: node["Index Name"], cond: node["Index Cond"] });
  for (const child of node.Plans ?? []) scans(child, out);
  return out;
}

/** Sort nodes that sort more than `limit` rows read from a big table (for a page of LIMIT rows: the index's order was not used). */
function bigSorts(node: PlanNode, limit: number, out: string[] = []): string[] {
  if (/Sort/.test(node["Node Type"])) {
    const input = node.Plans?.[0];
    const n = (input?.["Actual Rows"] ?? 0) * (input?.["Actual Loops"] ?? 1);
    const fromBig = scans(node).some((x) => (rows[x.relation!] ?? 0) >= BIG_ROWS);
    if (n > limit && fromBig) out.push(`${node["Node Type"]} of ${n} rows`);
  }
  for (const child of node.Plans ?? []) bigSorts(child, limit, out);
  return out;
}

/**
 * The plan's problems: as the planner chooses (run, EXPLAIN ANALYZE), a Seq
 * Scan of a table of BIG_ROWS rows or more, a whole index read without a
 * condition, or (for a statement with LIMIT, a page) more than 1,000 rows of
 * a big table sorted; and with enable_seqscan off, any Seq Scan.
 */
async function problemsOf(s: Recorded): Promise<string[]> {
  const problems: string[] = [];
  const natural = await plan(s, true);
  if (/\blimit\b/i.test(s.sql)) for (const sort of bigSorts(natural, 1_000)) problems.push(`planner's choice: ${sort} for a page, in ${s.sql}`);
  for (const x of scans(natural)) {
    const big = (rows[x.relation!] ?? 0) >= BIG_ROWS;
    if (x.type === "Seq Scan" && big) problems.push(`planner's choice: Seq Scan on ${x.relation} (${rows[x.relation!]} rows) in ${s.sql}`);
    // An index read end to end (no condition, only its order used) is a whole-table read too.
    if (/^Index (Only )?Scan$/.test(x.type) && big && !x.cond) problems.push(`planner's choice: ${x.type} of all of ${x.index} on ${x.relation} in ${s.sql}`);
  }
  for (const x of scans(await plan(s, false))) {
    if (x.type === "Seq Scan") problems.push(`no index usable: Seq Scan on ${x.relation} even with enable_seqscan off, in ${s.sql}`);
  }
  return problems;
}

async function plan(r: Recorded, seqscan: boolean): Promise<PlanNode> {
  await client.query(`set enable_seqscan = ${seqscan ? "on" : "off"}`);
  // As chosen: run (every hot query is a read), so row counts are the real ones, not the planner's guesses.
  const { rows: result } = await client.query(`explain (${seqscan ? "analyze, " : ""}format json) ${r.sql}`, r.bindings);
  return result[0]["QUERY PLAN"][0].Plan;
}

type Who = keyof typeof ids;
// The hot queries: what a crowd on a public drive page and an organiser's busy day send.
const HOT: Record<string, (w: (typeof ids)[Who]) => Promise<unknown>> = {
  "public drive (progress)": (w) => lib.service.publicDrive(w.slug),
  "public drop points + tallies": (w) => lib.service.publicDropPoints(w.slug),
  "public tallies per drop point": (w) => lib.balances.dropPointTallies(w.drive),
  "last haul per drop point": (w) => lib.balances.lastHaulAt([w.point]),
  "stock": (w) => lib.balances.driveStock(w.group, w.drive),
  "heater claims": (w) => lib.balances.heaterClaims(w.group, w.drive),
  "ledger list, first page": (w) => lib.ledgerList.listLedgerPage(w.group, { driveId: w.drive }, 50, "Europe/London"),
  "ledger list, whole group": (w) => lib.ledgerList.listLedgerPage(w.group, {}, 50, "Europe/London"),
  "ledger list, one drop point": (w) => lib.ledgerList.listLedgerPage(w.group, { dropPointId: w.point }, 50, "Europe/London"),
  "ledger list, a later page": (w) => lib.ledgerList.listLedgerPage(w.group, { driveId: w.drive, cursor: w.middle }, 50, "Europe/London"),
  "open hauls": (w) => lib.ledger.listHauls(w.group, w.drive, { open: true }),
  "drive chart": (w) => lib.ledger.driveChartBasics(w.group, w.drive),
  "search": (w) => lib.search.searchGroup(w.group, "bench"),
  "drop points (organiser)": (w) => lib.drives.listDropPoints(w.group, w.drive),
  "drives (organiser)": (w) => lib.drives.listDrives(w.group),
  "full bins": (w) => lib.fill.listFullBins(w.group, w.drive),
  "organiser dashboard": (w) => lib.dashboard.organiserDashboard(w.group),
};

describe.each(["busy", "small"] as const)("hot queries of the %s group", (who) => {
  it.each(Object.keys(HOT))("%s: no big-table scan or page sort, an index for every filter", async (label) => {
    const statements = await recorded(() => HOT[label](ids[who]));
    expect(statements.length, "the call sent no query").toBeGreaterThan(0);
    const problems: string[] = [];
    for (const s of statements) {
      problems.push(...(await problemsOf(s)));
      if (process.env.HOT_PLANS_OUT) {
        await client.query("set enable_seqscan = on");
        const text = await client.query(`explain (analyze, buffers) ${s.sql}`, s.bindings); // all of them are reads
        dump.push({ who, label, sql: s.sql, plan: text.rows.map((r) => r["QUERY PLAN"]).join("\n") });
      }
    }
    expect(problems).toEqual([]);
  });
});

/** Ledger lines read by a plan: every scan of ledger_lines, its rows times its loops (EXPLAIN ANALYZE's actual counts). */
function ledgerLinesRead(node: PlanNode): number {
  const own = node["Relation Name"] === "ledger_lines" && /Scan/.test(node["Node Type"]) ? (node["Actual Rows"] ?? 0) * (node["Actual Loops"] ?? 1) : 0;
  return own + (node.Plans ?? []).reduce((sum, child) => sum + ledgerLinesRead(child), 0);
}

// A page of 50 (+1 to know there is more) through the index, each line's undo looked up, and the count's 1,001.
const LEDGER_READ_BOUND = LEDGER_COUNT_CAP + 1 + 3 * 51;
const LEDGER_LIST = ["ledger list, first page", "ledger list, whole group", "ledger list, a later page"];

describe.each(["busy", "small"] as const)("the ledger list of the %s group", (who) => {
  it.each(LEDGER_LIST)(`%s reads at most ${LEDGER_READ_BOUND} ledger lines, however many the group has`, async (label) => {
    const statements = await recorded(() => HOT[label](ids[who]));
    let read = 0;
    for (const s of statements) read += ledgerLinesRead(await plan(s, true));
    expect(read).toBeGreaterThan(0);
    expect(read, `ledger lines read for one page (the drive has ${ids[who].lines})`).toBeLessThanOrEqual(LEDGER_READ_BOUND);
  });
});

it("the busy drive has far more lines than a page and its count may read, so a full count would show", () => {
  expect(ids.busy.lines).toBeGreaterThan(5 * LEDGER_READ_BOUND);
});

it("the check itself flags a filter no index serves and a big table read whole", async () => {
  // Not a query of the app: a filter on quantity (no index) and a count of the whole ledger.
  const noIndex = await problemsOf({ sql: "select id from ledger_lines where quantity = $1 and reason = 'other'", bindings: [7] });
  expect(noIndex.join("\n")).toMatch(/no index usable: Seq Scan on ledger_lines/);
  const sorted = await problemsOf({ sql: "select id from ledger_lines where group_id = $1 order by quantity, id limit 20", bindings: [ids.small.group] });
  expect(sorted.join("\n")).toMatch(/Sort of \d+ rows for a page/);
  const wholeIndex = await problemsOf({ sql: "select id, quantity from ledger_lines order by id desc limit 20 offset 0", bindings: [] });
  expect(wholeIndex.join("\n")).toMatch(/of all of ledger_lines_pkey/);
  const whole = await problemsOf({ sql: "select sum(quantity) from ledger_lines", bindings: [] });
  expect(whole.join("\n")).toMatch(/planner's choice: Seq Scan on ledger_lines/);
});

it("the plans database has the shape the checks need: a busy group with a tenth of the ledger among 200 others", () => {
  expect(rows.ledger_lines).toBeGreaterThan(250_000);
  expect(rows.groups).toBeGreaterThan(200);
});
