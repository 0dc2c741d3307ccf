import "server-only";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { notFound } from "@/lib/api/errors";
import { forgetEverywhere } from "@/lib/cache/broadcast";
import { sendMail } from "@/lib/mail/outbox";
import { SIGN_UP_MAIL_RULE, mayMail } from "./mail-limits";
import { verificationMail } from "./mail-text";
import { VERIFY_HOURS, newToken, openLinkRow } from "./tokens";

/** A fresh link to prove the address (within the per-address mail limit); earlier links keep working until they expire. */
export async function mailVerification(userId: string, email: string): Promise<void> {
  if (!(await mayMail(SIGN_UP_MAIL_RULE, email))) return;
  const { token, hash } = newToken();
  await db("email_verifications").insert({ user_id: userId, token_hash: hash, expires_at: db.raw(`now() + interval '${VERIFY_HOURS} hours'`) });
  const mail = verificationMail({ link: `${env().APP_URL}/verify/${token}`, hours: VERIFY_HOURS });
  await sendMail({ groupId: null, to: email, kind: "email_verification", ...mail });
}

/** Sends a new link when the address has an account still waiting for one; says nothing either way. */
export async function resendVerification(email: string): Promise<void> {
  const user = await db("users").select("id", "email").where({ email }).whereNull("email_verified_at").first();
  if (user) await mailVerification(user.id, user.email);
}

/** Opening the link proves the address; every link of that person is used up. Returns the proven address. */
export async function proveEmail(token: string): Promise<string> {
  const email = await db.transaction(async (trx) => {
    const row = await openLinkRow(trx, "email_verifications", token);
    if (!row) throw notFound("That confirmation link is not valid any more: it was used or it expired. Ask for a new one.");
    const [user] = await trx("users")
      .update({ email_verified_at: trx.raw("coalesce(email_verified_at, now())") })
      .where({ id: row.user_id })
      .returning("email");
    await trx("email_verifications").update({ used_at: trx.fn.now() }).where({ user_id: row.user_id }).whereNull("used_at");
    return user.email as string;
  });
  // Also reached from the link's page, outside endpoint(): nothing cached may still say "unproven".
  await forgetEverywhere();
  return email;
}
