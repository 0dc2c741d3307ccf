import "server-only";
import bcrypt from "bcryptjs";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { notFound } from "@/lib/api/errors";
import { sendMail } from "@/lib/mail/outbox";
import { endSessions } from "@/lib/auth/queries";
import { BCRYPT_COST } from "./queries";
import { RESET_MAIL_RULE, mayMail } from "./mail-limits";
import { clearSignInTries } from "./sign-in-limits";
import { resetMail } from "./mail-text";
import { RESET_MINUTES, newToken, openLinkRow } from "./tokens";

/** Sends a reset link if the address has an account; says nothing either way. */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await db("users").where({ email }).first();
  if (!user) return;
  // A few links an hour are enough; more would let anyone flood someone's inbox.
  if (!(await mayMail(RESET_MAIL_RULE, user.email))) return;
  const { token, hash } = newToken();
  await db("password_resets").insert({ user_id: user.id, token_hash: hash, expires_at: db.raw(`now() + interval '${RESET_MINUTES} minutes'`) });
  const mail = resetMail({ link: `${env().APP_URL}/reset/${token}`, minutes: RESET_MINUTES });
  await sendMail({ groupId: null, to: user.email, kind: "password_reset", ...mail });
}

/**
 * Sets the new password once; every other open link of that person stops
 * working too. The link came by e-mail, so it also proves the address; every
 * session of the person ends (whoever else knew the old password is out), and
 * the failed sign-in counts of the address are cleared: the reset is the way
 * back in after a lockout.
 */
export async function confirmPasswordReset(token: string, password: string): Promise<void> {
  const hash = await bcrypt.hash(password, BCRYPT_COST);
  const email = await db.transaction(async (trx) => {
    const reset = await openLinkRow(trx, "password_resets", token);
    if (!reset) throw notFound("That reset link is not valid any more: it was used or it expired. Ask for a new one.");
    await trx("users")
      .update({ password_hash: hash, email_verified_at: trx.raw("coalesce(email_verified_at, now())") })
      .where({ id: reset.user_id });
    await endSessions(reset.user_id, trx);
    await trx("password_resets").update({ used_at: trx.fn.now() }).where({ user_id: reset.user_id }).whereNull("used_at");
    // password_resets.user_id is a foreign key: the person is there.
    return (await trx("users").select("email").where({ id: reset.user_id }).first())!.email;
  });
  await clearSignInTries(email);
}
