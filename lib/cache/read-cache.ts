import "server-only";
import { LRUCache } from "lru-cache";

// Hot read answers kept for a moment in this server process, so a crowd
// opening the same map costs one query, not one each. Two spaces:
// - "people": who is signed in as what (membership, role, names);
// - "data": everything else (a drive's public drop points, its stock).
// Every write clears both, on every server (endpoint() and action() call
// forgetEverywhere() in lib/cache/broadcast.ts after any request that is not a
// GET or HEAD and was not refused with a 4xx; the upload callbacks call it too); a handler that declares it never changes people (the ledger's) clears
// "data" only. So a person who changes something sees it on their next read.
// Another server process, or a script writing straight to the database, shows
// up within READ_CACHE_MS. READ_CACHE_MS=0 turns it off.

const ttl = Math.max(0, Number(process.env.READ_CACHE_MS ?? 2_000));

type Loader = () => Promise<unknown>;
export type CacheSpace = "people" | "data";

// Concurrent misses for one key share one load. clear() aborts a load in
// flight, so an answer read before a write is never kept after it.
const makeSpace = () => ({
  // Bumped by every clear; a load that a write overtook is not trusted.
  generation: 0,
  cache: new LRUCache<string, { value: unknown }, Loader>({
    max: 1_000,
    ttl: ttl || 1,
    fetchMethod: async (_key, _stale, { context }) => ({ value: await context() }),
  }),
});
// Kept on globalThis: the server may load this module once per route bundle,
// and a write in one route must clear what a page in another has kept.
const shared = globalThis as typeof globalThis & { __cantroveReadCache?: Record<CacheSpace, ReturnType<typeof makeSpace>> };
const spaces = (shared.__cantroveReadCache ??= { people: makeSpace(), data: makeSpace() });

export async function cachedRead<T>(key: string, load: () => Promise<T>, space: CacheSpace = "data"): Promise<T> {
  if (ttl === 0) return load();
  const s = spaces[space];
  const seen = s.generation;
  try {
    const entry = await s.cache.fetch(key, { context: load });
    if (entry) return entry.value as T;
  } catch (error) {
    if (s.generation === seen) throw error;
  }
  // A write cleared the cache while this load ran: read again, uncached.
  return load();
}

/** Called after every write this process handles; "data" when the write cannot have changed anyone's membership. */
export function forgetReads(scope: "all" | "data" = "all"): void {
  for (const name of scope === "all" ? (["people", "data"] as const) : (["data"] as const)) {
    spaces[name].generation += 1;
    spaces[name].cache.clear();
  }
}
