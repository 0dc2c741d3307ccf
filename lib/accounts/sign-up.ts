import "server-only";
import bcrypt from "bcryptjs";
import { randomBytes, randomUUID } from "node:crypto";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail/outbox";
import { BCRYPT_COST } from "./queries";
import { SIGN_UP_MAIL_RULE, mayMail } from "./mail-limits";
import { signUpAttemptMail } from "./mail-text";
import { mailVerification } from "./verification";
import type { SignUpInput } from "./schemas";
import { slugify } from "./tokens";

/**
 * A new person and a new group, with that person as its organiser. The address
 * is not proven yet: a link goes to it, and until it is opened nobody can sign
 * in. An address that already has an account gets the same answer (so the
 * answer tells no one which addresses have accounts), nothing is created, and
 * its owner is told by e-mail instead.
 */
export async function signUp(input: SignUpInput): Promise<{ groupId: string; slug: string }> {
  const hash = await bcrypt.hash(input.password, BCRYPT_COST);
  const slug = slugify(input.groupName, randomBytes(3).toString("hex"));
  const created = await db.transaction(async (trx) => {
    const [user] = await trx("users")
      .insert({ email: input.email, name: input.name, password_hash: hash })
      .onConflict("email")
      .ignore()
      .returning("id");
    if (!user) return null;
    const [group] = await trx("groups").insert({ slug, name: input.groupName }).returning("id");
    await trx("memberships").insert({ group_id: group.id, user_id: user.id, role: "organiser" });
    return { userId: user.id as string, groupId: group.id as string };
  });
  if (!created) {
    await tellOwner(input.email);
    return { groupId: randomUUID(), slug };
  }
  await mailVerification(created.userId, input.email);
  return { groupId: created.groupId, slug };
}

async function tellOwner(email: string): Promise<void> {
  if (!(await mayMail(SIGN_UP_MAIL_RULE, email))) return;
  const base = env().APP_URL;
  const mail = signUpAttemptMail({ signInLink: `${base}/signin`, resetLink: `${base}/forgot` });
  await sendMail({ groupId: null, to: email, kind: "sign_up_attempt", ...mail });
}
