import type { LimitRule, Limits } from "@/lib/api/rate-limit-rules";

// Unsubscribing needs no session (RFC 8058), so it is an anonymous write: a
// mail provider posts once per message, a script guessing tokens far more.
export const NOTIFY_LIMITS = {
  unsubscribePerClient: { name: "unsubscribe-client", points: 60, durationSec: 3600 },
} as const satisfies Record<string, LimitRule>;

export const UNSUBSCRIBE_LIMITS = [{ rule: NOTIFY_LIMITS.unsubscribePerClient, by: "client" }] as const satisfies Limits;
