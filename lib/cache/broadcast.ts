import "server-only";
import { randomUUID } from "node:crypto";
import pg from "pg";
import { db } from "@/lib/db";
import { ackReceived, awaitAcks } from "./acks";
import { forgetReads } from "./read-cache";
import { noteWriteLsn } from "./write-fence";

// Every server process keeps its own short read cache (read-cache.ts). A write
// through one server must clear the others' too: after the write's transaction
// has committed, the writing server sends NOTIFY on CHANNEL with what to clear
// and the primary's WAL position; every server LISTENs on one direct
// connection of its own (LISTEN holds session state, so never through a
// transaction-mode pooler: DATABASE_LISTEN_URL, else DATABASE_URL) and clears
// its cache when the message comes, then says so on the writer's ackChannel; the write's
// answer waits for every other server's acknowledgement (acks.ts), so the
// writer's next request, to whichever server, finds the cache cleared. With no
// other server listening there is nothing to wait for. The TTL stays as a
// safety net for a message lost while a listener was reconnecting (it clears
// everything when it comes back, too).
export const CHANNEL = "cantrove_reads";
// Each server hears acknowledgements on a channel of its own, so a write's answers go to
// its writer only (one shared channel would hand every server every other's).
export const ackChannel = (origin: string) => `cantrove_reads_ack_${origin.replace(/-/g, "")}`;
// application_name: the prefix names the listeners, the origin tells this process's own
// connections (an old one may linger after a reconnect) from the other servers'.
const LISTENER_NAME = "cantrove-listen";

type Scope = "all" | "data";
const shared = globalThis as typeof globalThis & {
  __cantroveBroadcast?: { origin: string; client: pg.Client | null; started: boolean; connected: boolean; retryMs: number; peers: number };
};
const state = (shared.__cantroveBroadcast ??= { origin: randomUUID(), client: null, started: false, connected: false, retryMs: 250, peers: 0 });

// The longest a write waits for the other servers' acknowledgements.
const ACK_WAIT_MS = 200;
// How often the listener counts the other servers listening (pg_stat_activity).
const PEER_COUNT_MS = 1_000;

// Writes that finish while a NOTIFY is on its way share the next one (as a
// database shares one fsync among commits that arrive together): under load a
// server sends one NOTIFY per round trip, not one per write. Each message is
// sent after every write that joined it has committed, and "all" covers "data".
// On globalThis too, so writes through different route bundles share batches.
interface Batch { scope: Scope; done: Promise<void>; release: () => void }
const sharedBatches = globalThis as typeof globalThis & { __cantroveNotifyBatches?: { sending: boolean; next: Batch | null } };
const batches = (sharedBatches.__cantroveNotifyBatches ??= { sending: false, next: null });

function joinNextBatch(scope: Scope): Promise<void> {
  if (batches.next) {
    if (scope === "all") batches.next.scope = "all";
    return batches.next.done;
  }
  let release = () => undefined as void;
  const done = new Promise<void>((resolve) => (release = resolve));
  batches.next = { scope, done, release };
  if (!batches.sending) void sendBatches();
  return done;
}

async function sendBatches(): Promise<void> {
  batches.sending = true;
  while (batches.next) {
    const batch = batches.next;
    batches.next = null;
    await sendOne(batch.scope);
    batch.release();
  }
  batches.sending = false;
}

async function sendOne(scope: Scope): Promise<void> {
  const id = `${state.origin}:${randomUUID()}`;
  // Counted before sending: a server that starts listening later cleared its cache as it started.
  const acked = state.connected ? awaitAcks(id, state.peers, ACK_WAIT_MS) : Promise.resolve();
  try {
    // pg_notify in its own statement: sent when that statement commits, after the writes it follows.
    const { rows } = await db.raw(
      `select pg_current_wal_lsn()::text as lsn, pg_notify(?, ? || '|' || pg_current_wal_lsn()::text)`,
      [CHANNEL, `${id}|${scope}`],
    );
    noteWriteLsn(rows[0]?.lsn);
    await acked;
  } catch (error) {
    // The writes themselves are done; other servers catch up within READ_CACHE_MS.
    console.warn("[cantrove] could not tell other servers to clear their read cache:", (error as Error).message);
  }
}

/** Clears this process's read cache at once, then tells every other server to clear theirs. Await it before answering the write. */
export async function forgetEverywhere(scope: Scope = "all"): Promise<void> {
  forgetReads(scope);
  await joinNextBatch(scope);
}

export function parseMessage(payload: string | undefined): { origin: string; scope: Scope; lsn: string } | null {
  const [origin, scope, lsn] = (payload ?? "").split("|");
  if (!origin || (scope !== "all" && scope !== "data")) return null;
  return { origin, scope, lsn };
}

function connect(): void {
  const url = process.env.DATABASE_LISTEN_URL || process.env.DATABASE_URL;
  if (!url) return;
  const client = new pg.Client({ connectionString: url, application_name: `${LISTENER_NAME}:${state.origin}`, keepAlive: true });
  state.client = client;
  let retried = false;
  let counting: NodeJS.Timeout | undefined;
  const retry = (why: string) => {
    if (retried) return;
    retried = true;
    clearInterval(counting);
    state.connected = false;
    state.client = null;
    state.peers = 0;
    client.end().catch(() => undefined);
    console.warn(`[cantrove] read-cache listener lost (${why}); again in ${state.retryMs} ms`);
    setTimeout(connect, state.retryMs).unref();
    state.retryMs = Math.min(state.retryMs * 2, 5_000);
  };
  // The other servers' listeners on this database: how many acknowledgements a write waits for.
  const countPeers = () =>
    client
      .query(`select count(*)::int as n from pg_stat_activity where application_name like $1 and application_name <> $2 and datname = current_database()`, [`${LISTENER_NAME}:%`, `${LISTENER_NAME}:${state.origin}`])
      .then((r) => (state.peers = r.rows[0]?.n ?? 0))
      .catch(() => undefined);
  client.on("error", (e) => retry(e.message));
  client.on("end", () => retry("connection ended"));
  client.on("notification", (message) => {
    if (message.channel === ackChannel(state.origin)) {
      if (message.payload) ackReceived(message.payload);
      return;
    }
    const m = parseMessage(message.payload);
    if (!m) return;
    noteWriteLsn(m.lsn);
    const [origin] = m.origin.split(":");
    if (origin === state.origin) return; // this process cleared its own cache before sending
    forgetReads(m.scope);
    client.query(`select pg_notify($1, $2)`, [ackChannel(origin), m.origin]).catch(() => undefined);
  });
  client
    .connect()
    .then(() => client.query(`LISTEN ${CHANNEL}; LISTEN ${ackChannel(state.origin)}`))
    .then(countPeers)
    .then(() => {
      state.connected = true;
      state.retryMs = 250;
      counting = setInterval(countPeers, PEER_COUNT_MS);
      counting.unref();
      // Whatever was written while nobody listened here is not in the cache any more.
      forgetReads("all");
    })
    .catch((e: Error) => retry(e.message));
}

/** Starts this process's listener once (instrumentation.ts, and the first public read). */
export function startReadCacheListener(): void {
  if (state.started) return;
  state.started = true;
  connect();
}

export function readCacheListenerConnected(): boolean {
  return state.connected;
}

/** How many other servers' listeners this process last counted. */
export function readCachePeers(): number {
  return state.peers;
}
