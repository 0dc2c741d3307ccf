// How failed sign-ins are answered. Pure: the counts come from the database.
export const THROTTLE = {
  windowMinutes: 15,
  email: { slowAfter: 3, refuseAt: 10, stepMs: 250 },
  client: { slowAfter: 20, refuseAt: 50, stepMs: 100 },
  maxDelayMs: 2_000,
} as const;

export type ThrottleDecision =
  | { kind: "allow"; delayMs: number }
  | { kind: "refuse"; by: "email" | "client" };

/** Failures within the window for this e-mail and this client address → slow down or refuse. */
export function throttleDecision(emailFailures: number, clientFailures: number): ThrottleDecision {
  if (emailFailures >= THROTTLE.email.refuseAt) return { kind: "refuse", by: "email" };
  if (clientFailures >= THROTTLE.client.refuseAt) return { kind: "refuse", by: "client" };
  const byEmail = Math.max(0, emailFailures - THROTTLE.email.slowAfter + 1) * THROTTLE.email.stepMs;
  const byClient = Math.max(0, clientFailures - THROTTLE.client.slowAfter + 1) * THROTTLE.client.stepMs;
  return { kind: "allow", delayMs: Math.min(THROTTLE.maxDelayMs, Math.max(byEmail, byClient)) };
}

export function refusalMessage(by: "email" | "client", minutes: number): string {
  const wait = minutes <= 1 ? "a minute" : `${minutes} minutes`;
  return by === "email"
    ? `Too many failed sign-ins for this e-mail. Sign-in is paused: try again in ${wait}, or reset your password.`
    : `Too many failed sign-ins from this network. Sign-in is paused: try again in ${wait}.`;
}
