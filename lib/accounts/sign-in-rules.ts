import type { LimitRule } from "@/lib/api/rate-limit-rules";
import { waitText } from "@/lib/api/rate-limit-rules";

// How many sign-in tries are checked against a password hash. Pure, so the
// words and numbers are unit-tested; lib/accounts/sign-in-limits.ts counts.
//
// The tries of one e-mail from one client address back off in steps (a
// minute after 5, a quarter of an hour after 10, a day after 20), so a
// stranger elsewhere cannot lock the owner out; one client address is also
// limited across every e-mail it tries. A successful sign-in or password
// reset clears the e-mail's counts.
export const PAIR_RULES: readonly LimitRule[] = [
  { name: "sign-in-pair-minute", points: 5, durationSec: 60 },
  { name: "sign-in-pair-quarter", points: 10, durationSec: 15 * 60 },
  { name: "sign-in-pair-day", points: 20, durationSec: 24 * 60 * 60 },
];
export const CLIENT_RULE: LimitRule = { name: "sign-in-client", points: 50, durationSec: 15 * 60 };

/** The most tries of one e-mail from one address that reach the password check within a minute. */
export const PAIR_LIMIT = Math.min(...PAIR_RULES.map((r) => r.points));

/** The key of one e-mail from one client: the e-mail first, so a reset can clear every client's count. */
export const pairKey = (email: string, client: string) => `${email.toLowerCase()}|${client}`;

export function refusalMessage(by: "pair" | "client", retryAfterSec: number): string {
  const wait = waitText(retryAfterSec);
  return by === "pair"
    ? `Too many sign-in tries for this e-mail from your network. Try again in ${wait}, or reset your password: the reset e-mail lets you straight back in.`
    : `Too many failed sign-ins from your network. Try again in ${wait}.`;
}
