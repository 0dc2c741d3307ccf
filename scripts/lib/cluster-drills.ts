import pg from "pg";
import type { AppCluster } from "./cluster";

// The drills of README "How it scales", run against a started AppCluster by
// `npm run cluster -- --drill` (full size) and tests/integration/cluster-drills.test.ts (small).
// Each returns what it measured; the test asserts on it, and drillVerdicts
// (below) judges it by the same rules for the command line.

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

class Client {
  cookies = new Map<string, string>();
  async req(url: string, method = "GET", body?: unknown, headers: Record<string, string> = {}): Promise<Response> {
    const res = await fetch(url, {
      method,
      redirect: "manual",
      signal: AbortSignal.timeout(15_000),
      headers: {
        cookie: [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; "),
        ...(body !== undefined && typeof body !== "string" ? { "content-type": "application/json" } : {}),
        ...headers,
      },
      body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
    });
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair.indexOf("=");
      this.cookies.set(pair.slice(0, eq).trim(), pair.slice(eq + 1));
    }
    return res;
  }
  async signIn(base: string, email: string, password = "cantrove-demo"): Promise<void> {
    const csrf = (await (await this.req(`${base}/api/auth/csrf`)).json()) as { csrfToken: string };
    const form = new URLSearchParams({ csrfToken: csrf.csrfToken, email, password, json: "true" });
    const res = await this.req(`${base}/api/auth/callback/credentials`, "POST", form.toString(), { "content-type": "application/x-www-form-urlencoded" });
    await res.text();
    if (![...this.cookies.keys()].some((k) => k.includes("session-token"))) throw new Error(`sign-in as ${email} failed (${res.status})`);
  }
}

async function query<T = Record<string, unknown>>(url: string, sql: string, params: unknown[] = []): Promise<T[]> {
  const c = new pg.Client({ connectionString: url });
  await c.connect();
  try {
    return (await c.query(sql, params)).rows as T[];
  } finally {
    await c.end();
  }
}

export interface DrillContext {
  cluster: AppCluster;
  organiser: Client;
  driveId: string;
  slug: string;
  pointId: string;
  /** Every haul a server answered 201 for, by id. */
  acknowledged: string[];
}

export async function drillContext(cluster: AppCluster): Promise<DrillContext> {
  const [row] = await query<{ id: string; slug: string; point: string }>(
    cluster.primaryUrl,
    `select d.id, d.slug, p.id as point from drives d
       join drop_points p on p.drive_id = d.id and p.active
       join memberships m on m.group_id = d.group_id join users u on u.id = m.user_id
      where u.email = 'organiser@cantrove.test' and d.is_public order by d.starts_on desc, p.name limit 1`,
  );
  if (!row) throw new Error("the demo seed has no public drive with a drop point for organiser@cantrove.test");
  const organiser = new Client();
  await organiser.signIn(cluster.url, "organiser@cantrove.test");
  return { cluster, organiser, driveId: row.id, slug: row.slug, pointId: row.point, acknowledged: [] };
}

async function haul(ctx: DrillContext, base: string): Promise<{ ok: boolean; status: number }> {
  const res = await ctx.organiser.req(`${base}/api/drives/${ctx.driveId}/hauls`, "POST", { dropPointId: ctx.pointId, bags: 1 }, { "idempotency-key": crypto.randomUUID() });
  const body = (await res.json().catch(() => null)) as { id?: string } | null;
  if (res.status === 201 && body?.id) ctx.acknowledged.push(body.id);
  return { ok: res.status === 201, status: res.status };
}

async function publicHauls(ctx: DrillContext, base: string): Promise<number> {
  const res = await fetch(`${base}/api/public/drives/${ctx.slug}/drop-points`, { signal: AbortSignal.timeout(10_000) });
  if (res.status !== 200) throw new Error(`public drop points answered ${res.status}`);
  const points = (await res.json()) as { id: string; tallies: { hauls: number } }[];
  return points.find((p) => p.id === ctx.pointId)?.tallies.hauls ?? -1;
}

/** (1) A haul through server A shows in server B's public tallies on B's very next read, with B's cache warm. */
export async function drillFreshAcrossServers(ctx: DrillContext, rounds: number) {
  const [a, b] = [ctx.cluster.appUrl(0), ctx.cluster.appUrl(1)];
  let stale = 0;
  for (let i = 0; i < rounds; i++) {
    const before = await publicHauls(ctx, b); // warms B's short read cache
    if (!(await haul(ctx, a)).ok) throw new Error("haul through A refused");
    const after = await publicHauls(ctx, b);
    if (after !== before + 1) stale += 1;
  }
  return { rounds, stale };
}

/** (2) With no recent write, public reads are answered by the standby (its sessions named cantrove-read). */
export async function drillReadsOnStandby(ctx: DrillContext, reads: number) {
  await sleep(2_500); // past the probe interval (the standby has replayed the last write) and the 2 s cache
  // The query's opening words: pg_stat_activity keeps only the first track_activity_query_size (1 kB) of it.
  const seen = new Set<number>();
  const sample = async () => {
    const rows = await query<{ pid: number }>(
      ctx.cluster.standbyUrl,
      `select pid from pg_stat_activity where application_name = 'cantrove-read' and query ilike 'select p.id, p.name, p.address%'`,
    );
    for (const r of rows) seen.add(r.pid);
  };
  for (let i = 0; i < reads; i++) {
    await Promise.all([publicHauls(ctx, ctx.cluster.appUrl(i % 2)), publicHauls(ctx, ctx.cluster.appUrl((i + 1) % 2))]);
    await sample();
  }
  await sample();
  const [standby] = await query<{ standby: boolean }>(ctx.cluster.standbyUrl, "select pg_is_in_recovery() as standby");
  return { reads: reads * 2, standbySessionsThatRanPublicReads: seen.size, standbyIsInRecovery: standby.standby };
}

/** (3) Load through the balancer; server A is killed (SIGKILL) part way; errors counted, acknowledged hauls checked. */
export async function drillKillOneServer(ctx: DrillContext, seconds: number, concurrency: number) {
  let requests = 0;
  let errors = 0;
  const ackedBefore = ctx.acknowledged.length;
  const end = Date.now() + seconds * 1_000;
  const worker = async (w: number) => {
    for (let n = 0; Date.now() < end; n++) {
      requests += 1;
      try {
        if ((n + w) % 4 === 0) {
          if (!(await haul(ctx, ctx.cluster.url)).ok) errors += 1;
        } else {
          await publicHauls(ctx, ctx.cluster.url);
        }
      } catch {
        errors += 1;
      }
    }
  };
  const killer = (async () => {
    await sleep(Math.min(3_000, (seconds * 1_000) / 3));
    await ctx.cluster.killApp(0, "SIGKILL");
  })();
  await Promise.all([...Array.from({ length: concurrency }, (_, w) => worker(w)), killer]);
  const acked = [...new Set(ctx.acknowledged.slice(ackedBefore))];
  const [found] = await query<{ n: number }>(ctx.cluster.primaryUrl, "select count(*)::int as n from hauls where id = any($1::uuid[])", [acked]);
  await ctx.cluster.startApp(0); // back for the next drills
  return { requests, errors, errorRate: requests ? errors / requests : 1, acknowledged: acked.length, acknowledgedFound: found.n };
}

/** (5) The standby stopped: public pages still answer (from the primary). */
export async function drillReplicaDown(ctx: DrillContext, reads: number) {
  ctx.cluster.stopStandby();
  let ok = 0;
  const paths = [`/drives/${ctx.slug}`, `/api/public/drives/${ctx.slug}`, `/api/public/drives/${ctx.slug}/drop-points`, "/"];
  for (let i = 0; i < reads; i++) {
    const res = await fetch(`${ctx.cluster.url}${paths[i % paths.length]}`, { signal: AbortSignal.timeout(10_000) }).catch(() => null);
    if (res?.status === 200) ok += 1;
    await res?.arrayBuffer().catch(() => undefined);
  }
  ctx.cluster.startStandby();
  return { reads, ok };
}

/** (4) The primary stopped, the standby promoted, the app pointed at it: every acknowledged haul is there, and writes go on. */
export async function drillFailOver(ctx: DrillContext) {
  for (let i = 0; i < 3; i++) await haul(ctx, ctx.cluster.url);
  await ctx.cluster.failOver();
  for (let i = 0; i < 2; i++) await ctx.cluster.killApp(i, "SIGTERM");
  for (let i = 0; i < 2; i++) await ctx.cluster.startApp(i, ctx.cluster.promotedEnv());
  const ids = [...new Set(ctx.acknowledged)];
  const there = await query<{ id: string }>(ctx.cluster.standbyUrl, "select id from hauls where id = any($1::uuid[])", [ids]);
  const have = new Set(there.map((r) => r.id));
  const missing = ids.filter((id) => !have.has(id));
  const found = { n: have.size };
  const [role] = await query<{ standby: boolean }>(ctx.cluster.standbyUrl, "select pg_is_in_recovery() as standby");
  const after = await haul(ctx, ctx.cluster.url);
  return { acknowledged: ids.length, foundOnPromoted: found.n, missing, promotedIsPrimary: !role.standby, writeAfterFailOver: after.status };
}

export interface DrillResults {
  freshAcrossServers: Awaited<ReturnType<typeof drillFreshAcrossServers>>;
  readsOnStandby: Awaited<ReturnType<typeof drillReadsOnStandby>>;
  killOneServer: Awaited<ReturnType<typeof drillKillOneServer>>;
  replicaDown: Awaited<ReturnType<typeof drillReplicaDown>>;
  failOver: Awaited<ReturnType<typeof drillFailOver>>;
}

/**
 * Each drill's pass or fail, by the same rules as tests/integration/cluster-drills.test.ts,
 * so `npm run cluster -- --drill` says whether the cluster passed and not only what it measured.
 */
export function drillVerdicts(r: DrillResults): { drill: string; passed: boolean; measured: string }[] {
  const k = r.killOneServer;
  const f = r.failOver;
  return [
    { drill: "(1) a write through A is on B's next read", passed: r.freshAcrossServers.stale === 0, measured: `${r.freshAcrossServers.rounds - r.freshAcrossServers.stale} of ${r.freshAcrossServers.rounds} reads fresh` },
    {
      drill: "(2) public reads on the standby",
      passed: r.readsOnStandby.standbyIsInRecovery && r.readsOnStandby.standbySessionsThatRanPublicReads > 0,
      measured: `${r.readsOnStandby.standbySessionsThatRanPublicReads} standby session(s) ran them; standby in recovery: ${r.readsOnStandby.standbyIsInRecovery}`,
    },
    {
      drill: "(3) one app server killed mid-load",
      passed: k.errorRate < 0.01 && k.acknowledged > 5 && k.acknowledgedFound === k.acknowledged,
      measured: `${k.errors} errors in ${k.requests} requests (${(k.errorRate * 100).toFixed(2)} %), ${k.acknowledgedFound} of ${k.acknowledged} acknowledged hauls found`,
    },
    { drill: "(5) standby down: public pages answer", passed: r.replicaDown.ok === r.replicaDown.reads, measured: `${r.replicaDown.ok} of ${r.replicaDown.reads} answered` },
    {
      drill: "(4) primary stopped, standby promoted",
      passed: f.promotedIsPrimary && f.foundOnPromoted === f.acknowledged && f.writeAfterFailOver === 201,
      measured: `${f.foundOnPromoted} of ${f.acknowledged} acknowledged hauls on the promoted standby; a write after: ${f.writeAfterFailOver}`,
    },
  ];
}
