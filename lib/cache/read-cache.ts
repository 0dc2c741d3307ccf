import "server-only";
import { LRUCache } from "lru-cache";

// Hot read answers (a drive's public drop points, a drive's stock) kept for a
// moment in this server process, so a crowd opening the same map costs one
// query, not one each. Every write this process handles clears them all
// (route() calls forgetReads() after any request that is not a GET or HEAD,
// the upload callbacks call it too), so a person who changes something sees it
// on their next read. Another server process, or a script writing straight to
// the database, shows up within READ_CACHE_MS. READ_CACHE_MS=0 turns it off.

const ttl = Math.max(0, Number(process.env.READ_CACHE_MS ?? 2_000));

type Loader = () => Promise<unknown>;

// Bumped by every write; a load that a write overtook is not trusted.
let generation = 0;

const cache = new LRUCache<string, { value: unknown }, Loader>({
  max: 1_000,
  ttl: ttl || 1,
  // Concurrent misses for one key share one load. clear() aborts a load in
  // flight, so an answer read before a write is never kept after it.
  fetchMethod: async (_key, _stale, { context }) => ({ value: await context() }),
});

export async function cachedRead<T>(key: string, load: () => Promise<T>): Promise<T> {
  if (ttl === 0) return load();
  const seen = generation;
  try {
    const entry = await cache.fetch(key, { context: load });
    if (entry) return entry.value as T;
  } catch (error) {
    if (generation === seen) throw error;
  }
  // A write cleared the cache while this load ran: read again, uncached.
  return load();
}

/** Called after every write this process handles. */
export function forgetReads(): void {
  generation += 1;
  cache.clear();
}
