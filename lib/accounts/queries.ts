import "server-only";
import bcrypt from "bcryptjs";
import { randomBytes } from "node:crypto";
import { db } from "@/lib/db";
import { AppError, conflict, notFound } from "@/lib/api/errors";
import type { Role } from "@/lib/auth/roles";
import type { SignUpInput } from "./schemas";
import { slugify } from "./tokens";

export const BCRYPT_COST = 10;

const emailTaken = () =>
  new AppError("invalid_input", "Some fields need another look.", {
    fields: { email: "This e-mail already has an account. Sign in, or reset the password if you forgot it." },
  });

/** A new person and a new group, with that person as its organiser. */
export async function signUp(input: SignUpInput): Promise<{ userId: string; groupId: string; slug: string }> {
  const hash = await bcrypt.hash(input.password, BCRYPT_COST);
  return db.transaction(async (trx) => {
    const [user] = await trx("users")
      .insert({ email: input.email, name: input.name, password_hash: hash })
      .onConflict("email")
      .ignore()
      .returning("id");
    if (!user) throw emailTaken();
    const slug = slugify(input.groupName, randomBytes(3).toString("hex"));
    const [group] = await trx("groups").insert({ slug, name: input.groupName }).returning("id");
    await trx("memberships").insert({ group_id: group.id, user_id: user.id, role: "organiser" });
    return { userId: user.id, groupId: group.id, slug };
  });
}

export interface MemberRow {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

export async function listMembers(groupId: string): Promise<MemberRow[]> {
  return db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .select("u.id as userId", "u.name", "u.email", "m.role", "m.created_at as joinedAt")
    .where("m.group_id", groupId)
    .orderByRaw("case m.role when 'organiser' then 0 when 'builder' then 1 else 2 end, u.name");
}

export async function findMember(groupId: string, userId: string): Promise<MemberRow> {
  const row = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .select("u.id as userId", "u.name", "u.email", "m.role", "m.created_at as joinedAt")
    .where({ "m.group_id": groupId, "m.user_id": userId })
    .first();
  if (!row) throw notFound("That member");
  return row;
}

const LAST_ORGANISER = "A group needs at least one organiser. Make someone else organiser first.";

/**
 * Changes a member's role or removes them. The group's organiser rows are locked
 * first, so two organisers demoting each other at once cannot leave none.
 */
export async function updateMembership(groupId: string, userId: string, change: { role: Role } | { remove: true }): Promise<void> {
  await db.transaction(async (trx) => {
    const organisers: string[] = await trx("memberships")
      .where({ group_id: groupId, role: "organiser" })
      .forUpdate()
      .pluck("user_id");
    const member = await trx("memberships").where({ group_id: groupId, user_id: userId }).forUpdate().first();
    if (!member) throw notFound("That member");
    const losesOrganiser = member.role === "organiser" && ("remove" in change || change.role !== "organiser");
    if (losesOrganiser && organisers.length <= 1) throw conflict(LAST_ORGANISER, { rule: "last_organiser" });
    if ("remove" in change) await trx("memberships").where({ group_id: groupId, user_id: userId }).delete();
    else await trx("memberships").where({ group_id: groupId, user_id: userId }).update({ role: change.role });
  });
}

export async function findUserEmail(userId: string): Promise<string | null> {
  const row = await db("users").select("email").where({ id: userId }).first();
  return row?.email ?? null;
}
