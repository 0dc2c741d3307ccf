import "server-only";
import bcrypt from "bcryptjs";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { notFound } from "@/lib/api/errors";
import { sendMail } from "@/lib/mail/outbox";
import { BCRYPT_COST } from "./queries";
import { resetMail } from "./mail-text";
import { RESET_MINUTES, hashToken, newToken } from "./tokens";

const MAX_OPEN_RESETS = 3;

/** Sends a reset link if the address has an account; says nothing either way. */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await db("users").where({ email }).first();
  if (!user) return;
  const recent = await db("password_resets")
    .where({ user_id: user.id })
    .andWhere("created_at", ">", db.raw(`now() - interval '${RESET_MINUTES} minutes'`))
    .count<{ count: string }[]>("* as count")
    .first();
  // A few links an hour are enough; more would let anyone flood someone's inbox.
  if (Number(recent?.count ?? 0) >= MAX_OPEN_RESETS) return;
  const { token, hash } = newToken();
  await db("password_resets").insert({ user_id: user.id, token_hash: hash, expires_at: db.raw(`now() + interval '${RESET_MINUTES} minutes'`) });
  const mail = resetMail({ link: `${env().APP_URL}/reset/${token}`, minutes: RESET_MINUTES });
  await sendMail({ groupId: null, to: user.email, kind: "password_reset", ...mail });
}

/** Sets the new password once; every other open link of that person stops working too. */
export async function confirmPasswordReset(token: string, password: string): Promise<void> {
  const hash = await bcrypt.hash(password, BCRYPT_COST);
  await db.transaction(async (trx) => {
    const reset = await trx("password_resets")
      .where({ token_hash: hashToken(token) })
      .whereNull("used_at")
      .andWhere("expires_at", ">", trx.fn.now())
      .forUpdate()
      .first();
    if (!reset) throw notFound("That reset link is not valid any more: it was used or it expired. Ask for a new one.");
    await trx("users").update({ password_hash: hash }).where({ id: reset.user_id });
    await trx("password_resets").update({ used_at: trx.fn.now() }).where({ user_id: reset.user_id }).whereNull("used_at");
    const user = await trx("users").where({ id: reset.user_id }).first();
    await trx("sign_in_failures").where({ email: user.email }).delete();
  });
}
