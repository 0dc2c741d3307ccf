import "server-only";
import { RateLimiterMemory, RateLimiterRes } from "rate-limiter-flexible";
import { AppError } from "./errors";

// Stand-in until the PostgreSQL-backed store lands: same interface.
export interface LimitRule { name: string; points: number; durationSec: number; blockDurationSec?: number }

const limiters = new Map<string, RateLimiterMemory>();
function limiterFor(rule: LimitRule) {
  let limiter = limiters.get(rule.name);
  if (!limiter) {
    limiter = new RateLimiterMemory({ keyPrefix: rule.name, points: rule.points, duration: rule.durationSec, blockDuration: rule.blockDurationSec });
    limiters.set(rule.name, limiter);
  }
  return limiter;
}

export async function consumeLimit(rule: LimitRule, key: string, points = 1): Promise<void> {
  try {
    await limiterFor(rule).consume(key, points);
  } catch (error) {
    if (!(error instanceof RateLimiterRes)) throw error;
    const retryAfter = Math.max(1, Math.ceil(error.msBeforeNext / 1000));
    throw new AppError("rate_limited", `Too many of these for now. Try again in ${retryAfter} seconds.`, { details: { retryAfter } });
  }
}

export async function resetLimit(rule: LimitRule, key: string): Promise<void> {
  await limiterFor(rule).delete(key);
}
