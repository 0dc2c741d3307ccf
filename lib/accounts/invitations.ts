import "server-only";
import bcrypt from "bcryptjs";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import { sendMail } from "@/lib/mail/outbox";
import type { Actor } from "@/lib/auth/queries";
import type { Role } from "@/lib/auth/roles";
import { BCRYPT_COST } from "./queries";
import { invitationMail } from "./mail-text";
import { INVITATION_DAYS, hashToken, newToken } from "./tokens";
import type { AcceptInvitationInput, InvitationInput } from "./schemas";
import type { Invitation } from "./types";


const PENDING_COLUMNS = [
  "id",
  "email",
  "role",
  "sent_at as sentAt",
  "expires_at as expiresAt",
  db.raw("expires_at <= now() as expired"),
];

const open = (q: Knex.QueryBuilder) => q.whereNull("accepted_at").whereNull("revoked_at");

export async function listPendingInvitations(groupId: string): Promise<Invitation[]> {
  return db("invitations").select(PENDING_COLUMNS).where({ group_id: groupId }).modify(open).orderBy("sent_at", "desc");
}

async function mailInvitation(actor: Actor, email: string, role: Role, token: string) {
  const link = `${env().APP_URL}/invite/${token}`;
  const mail = invitationMail({ groupName: actor.group.name, inviterName: actor.user.name, role, link, days: INVITATION_DAYS });
  await sendMail({ groupId: actor.group.id, to: email, kind: "invitation", ...mail });
}

export async function createInvitation(actor: Actor, input: InvitationInput): Promise<Invitation> {
  const member = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where({ "m.group_id": actor.group.id, "u.email": input.email })
    .first();
  if (member) {
    throw new AppError("invalid_input", "Some fields need another look.", {
      fields: { email: "This person is already a member of your group." },
    });
  }
  const { token, hash } = newToken();
  const [row] = await db("invitations")
    .insert({
      group_id: actor.group.id,
      email: input.email,
      role: input.role,
      token_hash: hash,
      invited_by: actor.user.id,
      expires_at: db.raw(`now() + interval '${INVITATION_DAYS} days'`),
    })
    .onConflict(db.raw("(group_id, email) where accepted_at is null and revoked_at is null"))
    .ignore()
    .returning<Invitation[]>(PENDING_COLUMNS);
  if (!row) throw conflict("This address already has an open invitation. Resend it from the list instead.", { rule: "already_invited" });
  await mailInvitation(actor, input.email, input.role, token);
  return row;
}

/** A fresh link and a fresh 7 days; the old link stops working. */
export async function resendInvitation(actor: Actor, id: string): Promise<Invitation> {
  const { token, hash } = newToken();
  const [row] = await db("invitations")
    .update({ token_hash: hash, sent_at: db.fn.now(), expires_at: db.raw(`now() + interval '${INVITATION_DAYS} days'`) })
    .where({ id, group_id: actor.group.id })
    .modify(open)
    .returning<Invitation[]>(PENDING_COLUMNS);
  if (!row) throw notFound("That invitation");
  await mailInvitation(actor, row.email, row.role, token);
  return row;
}

export async function revokeInvitation(groupId: string, id: string): Promise<void> {
  const count = await db("invitations").update({ revoked_at: db.fn.now() }).where({ id, group_id: groupId }).modify(open);
  if (!count) throw notFound("That invitation");
}

export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  groupId: string;
  groupName: string;
  expired: boolean;
  hasAccount: boolean;
}

/** What the invitation page shows; null when the link is unknown, used or revoked. */
export async function findInvitationByToken(token: string): Promise<InvitationView | null> {
  const row = await db("invitations as i")
    .join("groups as g", "g.id", "i.group_id")
    .leftJoin("users as u", "u.email", "i.email")
    .select("i.id", "i.email", "i.role", "g.id as groupId", "g.name as groupName", db.raw("i.expires_at <= now() as expired"), db.raw("u.id is not null as \"hasAccount\""))
    .where("i.token_hash", hashToken(token))
    .whereNull("i.accepted_at")
    .whereNull("i.revoked_at")
    .first();
  return row ?? null;
}

const gone = () => notFound("That invitation link is not valid any more: it was used or withdrawn. Ask the organiser for a new one.");

/**
 * Accepts an invitation once. A new person sets name and password; someone with
 * an account must be signed in as the invited address, and only gets the group added.
 */
export async function acceptInvitation(input: AcceptInvitationInput, signedInUserId: string | null) {
  return db.transaction(async (trx) => {
    const inv = await trx("invitations").where({ token_hash: hashToken(input.token) }).whereNull("accepted_at").whereNull("revoked_at").forUpdate().first();
    if (!inv) throw gone();
    if (new Date(inv.expires_at).getTime() <= Date.now()) {
      throw conflict("This invitation has expired. Ask the organiser to send it again.", { rule: "expired" });
    }
    const existing = await trx("users").where({ email: inv.email }).first();
    let userId: string;
    if (existing) {
      if (!signedInUserId) throw new AppError("unauthenticated", `Sign in as ${inv.email} to accept this invitation.`);
      if (signedInUserId !== existing.id) {
        throw conflict(`This invitation is for ${inv.email}. Sign out and sign in with that address to accept it.`, { rule: "other_account" });
      }
      userId = existing.id;
    } else {
      const fields: Record<string, string> = {};
      if (!input.name) fields.name = "Enter your name.";
      if (!input.password) fields.password = "Choose a password.";
      if (Object.keys(fields).length) throw new AppError("invalid_input", "Some fields need another look.", { fields });
      const hash = await bcrypt.hash(input.password!, BCRYPT_COST);
      // The token came by e-mail to this address: accepting proves it.
      const [user] = await trx("users")
        .insert({ email: inv.email, name: input.name, password_hash: hash, email_verified_at: trx.fn.now() })
        .returning("id");
      userId = user.id;
    }
    await trx("memberships").insert({ group_id: inv.group_id, user_id: userId, role: inv.role }).onConflict(["group_id", "user_id"]).ignore();
    await trx("invitations").update({ accepted_at: trx.fn.now(), accepted_by: userId }).where({ id: inv.id });
    return { userId, groupId: inv.group_id as string, role: inv.role as Role, email: inv.email as string, newAccount: !existing };
  });
}
