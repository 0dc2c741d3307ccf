import "server-only";
import { db } from "@/lib/db";
import { AppError } from "@/lib/api/errors";
import { consumeLimit, resetLimit } from "@/lib/api/rate-limit";
import { LIMITS_TABLE, limiterFor } from "@/lib/api/rate-limit-store";
import { CLIENT_RULE, PAIR_RULES, pairKey, refusalMessage } from "./sign-in-rules";

const retryOf = (reason: unknown) => Number((reason as AppError).details?.retryAfter ?? 60);

/**
 * Called before the password is checked: takes one try from every limit at
 * once (one atomic upsert each), so parallel guesses cannot all get through.
 * Throws an Error whose message reaches the sign-in form when over.
 */
export async function takeSignInTry(email: string, client: string): Promise<void> {
  const rules = [...PAIR_RULES, CLIENT_RULE];
  const results = await Promise.allSettled(rules.map((rule) => consumeLimit(rule, rule === CLIENT_RULE ? client : pairKey(email, client))));
  const refused = results.flatMap((r, i) => (r.status === "rejected" ? [{ rule: rules[i], reason: r.reason }] : []));
  const broken = refused.find((r) => !(r.reason instanceof AppError && r.reason.code === "rate_limited"));
  if (broken) throw broken.reason;
  if (!refused.length) return;
  const byPair = refused.filter((r) => r.rule !== CLIENT_RULE);
  const worst = (list: typeof refused) => Math.max(...list.map((r) => retryOf(r.reason)));
  throw new Error(byPair.length ? refusalMessage("pair", worst(byPair)) : refusalMessage("client", worst(refused)));
}

/** The password matched: this e-mail's tries from this client start again, and the try is given back to the client. */
export async function signInSucceeded(email: string, client: string): Promise<void> {
  await Promise.all([...PAIR_RULES.map((rule) => resetLimit(rule, pairKey(email, client))), limiterFor(CLIENT_RULE).reward(client, 1)]);
}

/** After a password reset: the e-mail's counts from every client go, so the reset is the way back in. */
export async function clearSignInTries(email: string): Promise<void> {
  const prefixes = PAIR_RULES.map((rule) => `${rule.name}:${pairKey(email, "")}`);
  await db(LIMITS_TABLE)
    .where((q) => {
      for (const prefix of prefixes) q.orWhereRaw("starts_with(key, ?)", [prefix]);
    })
    .delete();
}
