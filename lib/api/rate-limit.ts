import "server-only";
import { AppError } from "./errors";
import { limiterFor } from "./rate-limit-store";
import { retryAfterSeconds, waitText, type LimitRule } from "./rate-limit-rules";

export type { LimitRule } from "./rate-limit-rules";

/** Consumes `points` from rule for key; throws AppError("rate_limited", message, { details: { retryAfter: <whole seconds> } }) when over. */
export async function consumeLimit(rule: LimitRule, key: string, points = 1): Promise<void> {
  try {
    await limiterFor(rule).consume(key, points);
  } catch (error) {
    // The library rejects with its result object when over the limit, with an Error when the store fails.
    if (error instanceof Error || typeof (error as { msBeforeNext?: unknown })?.msBeforeNext !== "number") throw error;
    const retryAfter = retryAfterSeconds((error as { msBeforeNext: number }).msBeforeNext);
    throw new AppError("rate_limited", `Too many tries. Try again in ${waitText(retryAfter)}.`, { details: { retryAfter } });
  }
}

export async function resetLimit(rule: LimitRule, key: string): Promise<void> {
  await limiterFor(rule).delete(key);
}
