// Safe to import anywhere: the shape of a limit and the pure parts of its answer.

export interface LimitRule {
  /** Unique per rule: the limiter and its keys are named after it. */
  name: string;
  /** How many points a key may use per window. */
  points: number;
  durationSec: number;
  /** Once over, the key stays refused this long (default: until the window ends). */
  blockDurationSec?: number;
}

/**
 * A rule and what it is counted by, declared once per operation and used by both
 * its JSON route (endpoint()) and its server action (action()): "client" is the
 * caller's address (worked out by server.mjs); a function takes a key from the path
 * (a server action's hidden fields) and the body (the action's parsed input), or
 * returns null to skip.
 */
export interface KeyedLimit<P = unknown, B = unknown> {
  rule: LimitRule;
  by: "client" | ((input: { params: P; body: B }) => string | null | undefined);
}

/** A declared list (lib/<domain>/limits.ts); endpoint() and action() check its keys against their own path and body. */
export type Limits = readonly KeyedLimit<never, never>[];

/** The e-mail address a body names, for rules counted per address. */
export const byEmail = ({ body }: { body: { email?: string | null } }) => body.email;

/** Whole seconds to wait, never 0, from the limiter's milliseconds. */
export function retryAfterSeconds(msBeforeNext: number): number {
  return Math.max(1, Math.ceil(msBeforeNext / 1000));
}

/** "a minute", "15 minutes", "2 hours": how a wait reads in a message. */
export function waitText(seconds: number): string {
  if (seconds <= 60) return "a minute";
  const minutes = Math.ceil(seconds / 60);
  if (minutes < 120) return `${minutes} minutes`;
  return `${Math.ceil(minutes / 60)} hours`;
}
