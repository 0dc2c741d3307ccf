import "server-only";
import { db } from "@/lib/db";
import { THROTTLE, refusalMessage, throttleDecision } from "./throttle";

const windowStart = () => db.raw(`now() - interval '${THROTTLE.windowMinutes} minutes'`);

async function countSince(column: "email" | "client", value: string): Promise<number> {
  const row = await db("sign_in_failures").where(column, value).andWhere("at", ">", windowStart()).count<{ count: string }[]>("* as count").first();
  return Number(row?.count ?? 0);
}

/** Minutes until enough failures age out of the window for sign-in to open again. */
async function minutesUntilOpen(column: "email" | "client", value: string, refuseAt: number): Promise<number> {
  const row = await db("sign_in_failures")
    .select(db.raw(`ceil(extract(epoch from (at + interval '${THROTTLE.windowMinutes} minutes' - now())) / 60) as minutes`))
    .where(column, value)
    .andWhere("at", ">", windowStart())
    .orderBy("at", "desc")
    .offset(refuseAt - 1)
    .first();
  return Math.max(1, Number(row?.minutes ?? THROTTLE.windowMinutes));
}

/**
 * Called before checking a password: waits when there were recent failures and
 * throws (the message reaches the sign-in form) when there were too many.
 */
export async function guardSignIn(email: string, client: string): Promise<void> {
  const [emailFailures, clientFailures] = await Promise.all([countSince("email", email), countSince("client", client)]);
  const decision = throttleDecision(emailFailures, clientFailures);
  if (decision.kind === "refuse") {
    const minutes =
      decision.by === "email"
        ? await minutesUntilOpen("email", email, THROTTLE.email.refuseAt)
        : await minutesUntilOpen("client", client, THROTTLE.client.refuseAt);
    throw new Error(refusalMessage(decision.by, minutes));
  }
  if (decision.delayMs > 0) await new Promise((r) => setTimeout(r, decision.delayMs));
}

export async function recordSignInFailure(email: string, client: string): Promise<void> {
  await db("sign_in_failures").insert({ email: email.slice(0, 254), client });
  // Old rows are of no use; trimming here keeps the table small without a job.
  if (Math.random() < 0.02) await db("sign_in_failures").where("at", "<", db.raw("now() - interval '1 day'")).delete();
}

export async function clearSignInFailures(email: string): Promise<void> {
  await db("sign_in_failures").where({ email }).delete();
}
