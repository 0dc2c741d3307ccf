import "server-only";
import { RateLimiterPostgres } from "rate-limiter-flexible";
import { db } from "@/lib/db";
import type { LimitRule } from "./rate-limit-rules";

// One rate-limiter-flexible limiter per rule name, all on the one table of
// migration 20261203010000 (each limiter prefixes its keys with the rule's
// name). Counting happens in PostgreSQL in one upsert, so every app server
// shares the counts and parallel requests cannot slip past the limit.
export const LIMITS_TABLE = "rate_limits";

const limiters = new Map<string, RateLimiterPostgres>();

export function limiterFor(rule: LimitRule): RateLimiterPostgres {
  let limiter = limiters.get(rule.name);
  if (!limiter) {
    limiter = new RateLimiterPostgres({
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
