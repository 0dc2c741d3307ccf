import "server-only";
import { RateLimiterPostgres } from "rate-limiter-flexible";
import { db } from "@/lib/db";
import type { LimitRule } from "./rate-limit-rules";

// One rate-limiter-flexible limiter per rule name, all on the one table of
// migration 20261203010000 (each limiter prefixes its keys with the rule's
// name). Counting happens in PostgreSQL in one upsert, so every app server
// shares the counts and parallel requests cannot slip past the limit.
export const LIMITS_TABLE = "rate_limits";

// The library names its statements (server-side prepared statements, kept per
// connection). Behind PgBouncer in transaction mode (1.18 does not track them)
// the next use may land on a server connection that never saw the PREPARE, so
// every query goes out unnamed (prepared and run in one go, as PgBouncer's
// docs allow) — the library's own internal method, checked by
// tests/unit/api/rate-limit-unnamed.test.ts.
type Query = { name?: string; text: string; values?: unknown[] };
class UnnamedRateLimiterPostgres extends RateLimiterPostgres {
  _query(q: Query): Promise<unknown> {
    const parent = RateLimiterPostgres.prototype as unknown as { _query: (this: unknown, q: Query) => Promise<unknown> };
    return parent._query.call(this, { text: q.text, values: q.values });
  }
}

const limiters = new Map<string, RateLimiterPostgres>();

export function limiterFor(rule: LimitRule): RateLimiterPostgres {
  let limiter = limiters.get(rule.name);
  if (!limiter) {
    limiter = new UnnamedRateLimiterPostgres({
      storeClient: db,
      storeType: "knex",
      tableName: LIMITS_TABLE,
      tableCreated: true,
      keyPrefix: rule.name,
      points: rule.points,
      duration: rule.durationSec,
      blockDuration: rule.blockDurationSec ?? 0,
    });
    limiters.set(rule.name, limiter);
  }
  return limiter;
}
