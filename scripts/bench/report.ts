import type { LoadResult } from "./load";
import type { PageResult } from "./page";

// Ratios to the two references and the targets the bench must meet on a 2-core machine.
export interface Target {
  name: string;
  limit: string;
  measured: string;
  met: boolean;
}

export interface Report {
  ratios: Record<string, { rpsVsFloor: number; p95VsFloor: number; rpsVsNaive: number }>;
  targets: Target[];
}

const r2 = (n: number) => Math.round(n * 100) / 100;

export function checkTargets(results: LoadResult[], page: PageResult, w: { balanceErrors: unknown[] }): Report {
  const by = (prefix: string) => results.find((r) => r.name.startsWith(prefix))!;
  const floor = by("floor");
  const naive = by("naive");
  const pub = by("GET public");
  const stock = by("GET stock");
  const proc = by("POST processing");
  const ratios = Object.fromEntries(
    results.map((r) => [r.name, { rpsVsFloor: r2(r.rps / floor.rps), p95VsFloor: r2(r.p95 / floor.p95), rpsVsNaive: r2(r.rps / naive.rps) }]),
  );
  const clean = (r: LoadResult) => r.errors === 0 && r.timeouts === 0 && r.non2xx === 0;
  const kb = (b: number) => `${(b / 1000).toFixed(1)} kB`;
  const targets: Target[] = [
    { name: "public tallies p95", limit: "<= 25 ms", measured: `${pub.p95} ms`, met: pub.p95 <= 25 && clean(pub) },
    { name: "public tallies throughput vs floor", limit: ">= 80 %", measured: `${Math.round((pub.rps / floor.rps) * 100)} %`, met: pub.rps >= 0.8 * floor.rps },
    { name: "stock p95", limit: "<= 30 ms", measured: `${stock.p95} ms`, met: stock.p95 <= 30 && clean(stock) },
    { name: "processing writes p95", limit: "<= 60 ms", measured: `${proc.p95} ms`, met: proc.p95 <= 60 && clean(proc) },
    { name: "balances equal ledger sums after the run", limit: "0 differences", measured: `${w.balanceErrors.length} differences`, met: w.balanceErrors.length === 0 },
    { name: "stock throughput vs naive", limit: ">= 20x", measured: `${r2(stock.rps / naive.rps)}x`, met: stock.rps >= 20 * naive.rps },
    { name: "public drive page first-load JS (compressed)", limit: "<= 200 kB", measured: kb(page.jsEncodedBytes), met: page.jsEncodedBytes <= 200_000 },
    { name: "public drive page LCP", limit: "<= 1500 ms", measured: `${page.lcpMs ?? "none"} ms`, met: page.lcpMs !== null && page.lcpMs <= 1500 },
  ];
  return { ratios, targets };
}

export function printTable(results: LoadResult[], report: Report): void {
  const pad = (s: string | number, n: number) => String(s).padStart(n);
  console.log("\n" + ["endpoint".padEnd(38), pad("req/s", 8), pad("p50", 7), pad("p95", 7), pad("p99", 7), pad("x floor", 8), pad("x naive", 8), pad("non-2xx", 8)].join(" "));
  for (const r of results) {
    const q = report.ratios[r.name];
    console.log([r.name.padEnd(38), pad(r.rps, 8), pad(r.p50, 7), pad(r.p95, 7), pad(r.p99, 7), pad(q.rpsVsFloor, 8), pad(q.rpsVsNaive, 8), pad(r.non2xx + r.errors, 8)].join(" "));
  }
  console.log("(latencies in ms; x floor / x naive = requests/s divided by the reference's)\n");
  for (const t of report.targets) console.log(`${t.met ? "MET    " : "NOT MET"}  ${t.name}: ${t.measured} (target ${t.limit})`);
  console.log("");
}
