import "server-only";
import knex, { type Knex } from "knex";
import { knexConfig } from "@/knexfile";
import { db } from "@/lib/db";
import { isDatabaseUnreachable } from "@/lib/db-errors";
import { lastWriteLsn, lsnValue } from "@/lib/cache/write-fence";
import { startReadCacheListener } from "@/lib/cache/broadcast";

// Public reads (lib/*/public-queries.ts) may go to a read replica:
// DATABASE_READ_URL, a streaming hot standby of DATABASE_URL. Everything else
// (all a signed-in person does, every write) stays on the primary. A
// replica's answer is used only when
//  - the background probe (every READ_REPLICA_PROBE_MS, not per request) last
//    reached it and it was at most READ_REPLICA_MAX_LAG_MS behind the primary, and
//  - it has replayed past the newest write this server knows of (its own, and
//    every other server's through their NOTIFY: lib/cache/write-fence.ts),
// else the read goes to the primary. A replica that fails mid-read is marked
// down and the read is done again on the primary.
const probeMs = Math.max(50, Number(process.env.READ_REPLICA_PROBE_MS ?? 250));
const maxLagMs = Math.max(0, Number(process.env.READ_REPLICA_MAX_LAG_MS ?? 1_000));

interface ReplicaState {
  db: Knex | null;
  probeDb: Knex | null; // its own connection, named apart, so the probe never shows as a public read
  up: boolean;
  replayed: bigint; // the replica's replay position at the last probe
  caughtUpAt: number; // when the probe last saw it at the primary's position
  lagMs: number;
  timer: NodeJS.Timeout | null;
}
const shared = globalThis as typeof globalThis & { __cantroveReplica?: ReplicaState };
const replica = (shared.__cantroveReplica ??= (() => {
  const url = process.env.DATABASE_READ_URL;
  const s: ReplicaState = { db: null, probeDb: null, up: false, replayed: 0n, caughtUpAt: 0, lagMs: Infinity, timer: null };
  if (!url) return s;
  const config = knexConfig(url);
  // Named, so the replica's pg_stat_activity shows which of its sessions are Cantrove's public reads.
  s.db = knex({ ...config, connection: { connectionString: url, application_name: "cantrove-read" }, pool: { min: 0, max: Number(process.env.DB_READ_POOL_MAX ?? process.env.DB_POOL_MAX ?? 10) }, acquireConnectionTimeout: 2_000 });
  s.probeDb = knex({ ...config, connection: { connectionString: url, application_name: "cantrove-read-probe" }, pool: { min: 0, max: 1 }, acquireConnectionTimeout: 1_000 });
  return s;
})());

const withTimeout = <T>(p: Promise<T>, ms: number) =>
  Promise.race([p, new Promise<never>((_, reject) => setTimeout(() => reject(new Error("replica probe timed out")), ms).unref())]);

let probing = false;
async function probe(): Promise<void> {
  if (!replica.probeDb || probing) return;
  probing = true;
  try {
    // The primary's position first: a replica at or past it has everything committed before this probe.
    const primary = await withTimeout(db.raw(`select pg_current_wal_lsn()::text as lsn`), 1_000);
    const seen = await withTimeout(
      replica.probeDb.raw(`select pg_is_in_recovery() as standby, coalesce(pg_last_wal_replay_lsn(), pg_current_wal_lsn())::text as lsn`),
      1_000,
    );
    const p = lsnValue(primary.rows[0]?.lsn) ?? 0n;
    const r = lsnValue(seen.rows[0]?.lsn) ?? 0n;
    const now = Date.now();
    if (r >= p) replica.caughtUpAt = now;
    replica.replayed = r;
    replica.lagMs = replica.caughtUpAt ? now - replica.caughtUpAt : Infinity;
    replica.up = replica.lagMs <= maxLagMs;
  } catch {
    replica.up = false;
  } finally {
    probing = false;
  }
}

function ensureProbe(): void {
  if (!replica.db || replica.timer) return;
  replica.timer = setInterval(() => void probe(), probeMs);
  replica.timer.unref();
  void probe();
}

/** Where a public read would go now, and why (the health endpoint and the drills show it). */
export function readTarget(): { target: "replica" | "primary"; configured: boolean; lagMs: number | null } {
  ensureProbe();
  const useReplica = !!replica.db && replica.up && replica.replayed >= lastWriteLsn();
  return { target: useReplica ? "replica" : "primary", configured: !!replica.db, lagMs: Number.isFinite(replica.lagMs) ? replica.lagMs : null };
}

/** Runs a public read on the replica when it is fresh enough, else (or if it fails to answer) on the primary. */
export async function publicRead<T>(run: (q: Knex) => PromiseLike<T>): Promise<T> {
  startReadCacheListener();
  if (readTarget().target === "primary") return await run(db);
  try {
    return await run(replica.db!);
  } catch (error) {
    if (!isDatabaseUnreachable(error) && !isReplicaRefusal(error)) throw error;
    replica.up = false;
    return await run(db);
  }
}

// A standby can cancel a query that conflicts with replay (40001), or be shutting down (57P01…).
function isReplicaRefusal(error: unknown): boolean {
  const code = (error as { code?: string })?.code ?? "";
  return code === "40001" || code.startsWith("57") || /timeout|acquir/i.test((error as Error)?.message ?? "");
}
