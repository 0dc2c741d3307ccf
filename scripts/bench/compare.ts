import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { writeFileSync } from "node:fs";
import path from "node:path";
import { runLoad as defaultLoad, type LoadResult, type LoadTarget } from "./load";
import { serverCommand } from "../lib/serve";
import { waitForHealthy } from "../lib/wait";

// Side-by-side measurements: two setups (1 vs 1,000 groups, 1 vs 2 app
// servers) measured in the same run, endpoint by endpoint, in interleaved
// rounds, so the other load on a shared machine falls on both sides alike:
//  - before anything is measured, `settle` (the caller's) brings both
//    databases to the same state (VACUUM ANALYZE, a CHECKPOINT, no autovacuum
//    running), and each endpoint is warmed on A then B, for the same time;
//  - a round of an endpoint is four short runs, A B B A (odd rounds B A A B),
//    so a load that rises or falls during the round weighs on both sides
//    equally; the round's ratio is B's mean requests/s over A's;
//  - the ratio of an endpoint is the median of its rounds' ratios (one round
//    disturbed by a neighbour's job does not decide it), printed with the
//    rounds' lowest and highest;
//  - the floor (/api/health, one `select 1`) is measured the same way as the
//    control: its own ratio shows how much the two sides differ where the
//    database does nothing, i.e. what is left of the noise.
export interface Side {
  label: string;
  base: string;
  /** The endpoints to measure on this side (the same names, in the same order, on both sides). */
  targets: LoadTarget[];
}

export interface Comparison {
  a: string;
  b: string;
  rounds: number;
  seconds: number;
  connections: number;
  endpoints: {
    name: string;
    a: { rps: number; p95: number; non2xx: number };
    b: { rps: number; p95: number; non2xx: number };
    /** The median over the rounds of B's requests/s over A's. */
    ratio: number;
    /** The lowest and highest of the rounds' ratios. */
    spread: [number, number];
    /** All of B's requests over all of A's (same time on both sides). */
    ratioOfTotals: number;
    /** The same ratio divided by the floor's ratio (what is left once the setups' difference where the database does nothing is taken out). */
    ratioVsFloor: number;
    rounds: { a: number; b: number }[];
  }[];
}

/** The side order of a round's four runs: A B B A, then B A A B, … (0 = A, 1 = B). */
export function roundOrder(round: number): (0 | 1)[] {
  return round % 2 === 0 ? [0, 1, 1, 0] : [1, 0, 0, 1];
}

const r2 = (n: number) => Math.round(n * 100) / 100;
const median = (xs: number[]) => {
  const s = [...xs].sort((x, y) => x - y);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};

export async function compare(
  a: Side,
  b: Side,
  o: { rounds: number; seconds: number; warmup: number; connections: number; log: (s: string) => void; settle?: () => Promise<void>; load?: typeof defaultLoad },
): Promise<Comparison> {
  const runLoad = o.load ?? defaultLoad;
  if (a.targets.map((t) => t.name).join() !== b.targets.map((t) => t.name).join()) throw new Error("compare: both sides need the same endpoints");
  const runs: LoadResult[][][] = a.targets.map(() => [[], []]);
  const perRound: number[][] = a.targets.map(() => []);
  await o.settle?.();
  // Warm each endpoint on both sides alike, one side right after the other.
  for (let i = 0; i < a.targets.length; i++) for (const side of [a, b]) if (o.warmup > 0) await runLoad(side.base, side.targets[i], { connections: o.connections, seconds: o.warmup });
  for (let round = 0; round < o.rounds; round++) {
    for (let i = 0; i < a.targets.length; i++) {
      const got: [LoadResult[], LoadResult[]] = [[], []];
      for (const s of roundOrder(round)) {
        const side = s === 0 ? a : b;
        const r = await runLoad(side.base, side.targets[i], { connections: o.connections, seconds: o.seconds });
        got[s].push(r);
        runs[i][s].push(r);
      }
      const mean = (rs: LoadResult[]) => rs.reduce((x, r) => x + r.rps, 0) / rs.length;
      const [ra, rb] = [mean(got[0]), mean(got[1])];
      perRound[i].push(rb / Math.max(ra, 0.01));
      o.log(`round ${round + 1}/${o.rounds} ${a.targets[i].name}: ${a.label} ${r2(ra)} req/s, ${b.label} ${r2(rb)} req/s (${r2(rb / Math.max(ra, 0.01))})`);
    }
  }
  const sum = (rs: LoadResult[]) => rs.reduce((s, r) => s + r.requests, 0) / rs.reduce((s, r) => s + r.seconds, 0);
  const side = (rs: LoadResult[]) => ({ rps: r2(sum(rs)), p95: r2(median(rs.map((r) => r.p95))), non2xx: rs.reduce((s, r) => s + r.non2xx + r.errors + r.timeouts, 0) });
  const endpoints = a.targets.map((t, i) => {
    const [ra, rb] = runs[i];
    const ratios = perRound[i];
    const pairs = ratios.map((_, k) => ({ a: r2((ra[2 * k].rps + ra[2 * k + 1].rps) / 2), b: r2((rb[2 * k].rps + rb[2 * k + 1].rps) / 2) }));
    return {
      name: t.name, a: side(ra), b: side(rb), ratio: r2(median(ratios)), spread: [r2(Math.min(...ratios)), r2(Math.max(...ratios))] as [number, number],
      ratioOfTotals: r2(sum(rb) / sum(ra)), ratioVsFloor: 0, rounds: pairs,
    };
  });
  const floor = endpoints.find((e) => e.name.startsWith("floor"));
  for (const e of endpoints) e.ratioVsFloor = floor ? r2(e.ratio / floor.ratio) : e.ratio;
  return { a: a.label, b: b.label, rounds: o.rounds, seconds: o.seconds, connections: o.connections, endpoints };
}

export function printComparison(c: Comparison): void {
  const pad = (s: string | number, n: number) => String(s).padStart(n);
  console.log(`\n${c.b} vs ${c.a} (${c.rounds} interleaved rounds, each A B B A or B A A B, runs of ${c.seconds} s, ${c.connections} connections)`);
  console.log(["endpoint".padEnd(38), pad(c.a.slice(0, 12), 12), pad(c.b.slice(0, 12), 12), pad("ratio", 7), pad("rounds", 11), pad("totals", 7), pad("÷ floor", 8), pad("p95 A", 7), pad("p95 B", 7), pad("non-2xx", 8)].join(" "));
  for (const e of c.endpoints) {
    console.log([e.name.padEnd(38), pad(e.a.rps, 12), pad(e.b.rps, 12), pad(e.ratio, 7), pad(`${e.spread[0]}–${e.spread[1]}`, 11), pad(e.ratioOfTotals, 7), pad(e.ratioVsFloor, 8), pad(e.a.p95, 7), pad(e.b.p95, 7), pad(e.a.non2xx + e.b.non2xx, 8)].join(" "));
  }
  console.log("(requests/s over all rounds; ratio = median of the rounds' B / A; rounds = the lowest and highest round; totals = all B requests / all A requests; ÷ floor = ratio / the floor's ratio, the control)\n");
}

/** One more app server (server.mjs over the built app) on `port`; resolves once /api/health answers. */
export async function startAppServer(root: string, port: number, env: NodeJS.ProcessEnv, log: (s: string) => void): Promise<ChildProcess> {
  const child = spawn(...serverCommand(root, port), { cwd: root, env, stdio: ["ignore", "ignore", "pipe"] });
  child.stderr?.on("data", (d) => {
    const text = String(d).trim();
    if (text && !/ExperimentalWarning/.test(text)) log(`[app:${port}] ${text.slice(0, 300)}`);
  });
  await waitForHealthy(`http://127.0.0.1:${port}/api/health`, 90_000);
  return child;
}

/**
 * HAProxy from Debian's package with two front doors: `one` balances over the
 * first app server only, `two` over both. Measuring through the balancer on
 * both sides keeps its own cost out of the ratio. No health checks: a server
 * slow under the load (a check timing out) would be taken out mid-measurement.
 */
export function startBalancer(dir: string, o: { one: number; two: number; apps: [number, number] }, log: (s: string) => void): ChildProcess {
  const cfg = path.join(dir, "haproxy-bench.cfg");
  const backend = (name: string, apps: number[]) =>
    `backend ${name}\n  balance roundrobin\n${apps.map((p, i) => `  server app${i + 1} 127.0.0.1:${p}`).join("\n")}\n`;
  writeFileSync(
    cfg,
    `global\n  maxconn 1000\n\ndefaults\n  mode http\n  timeout connect 2s\n  timeout client 30s\n  timeout server 30s\n  option http-keep-alive\n\n` +
      `frontend one\n  bind 127.0.0.1:${o.one}\n  default_backend one\n\nfrontend two\n  bind 127.0.0.1:${o.two}\n  default_backend two\n\n` +
      backend("one", [o.apps[0]]) + "\n" + backend("two", o.apps),
  );
  const check = spawnSync("/usr/sbin/haproxy", ["-c", "-q", "-f", cfg], { encoding: "utf8" });
  if (check.status !== 0) throw new Error(`haproxy refused its configuration:\n${check.stdout}${check.stderr}`);
  const child = spawn("/usr/sbin/haproxy", ["-db", "-f", cfg], { stdio: ["ignore", "ignore", "pipe"] });
  child.stderr?.on("data", (d) => {
    const text = String(d).trim();
    if (/ALERT/.test(text)) log(`[haproxy] ${text.slice(0, 300)}`);
  });
  return child;
}
