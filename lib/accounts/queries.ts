import "server-only";
import { db } from "@/lib/db";
import { conflict, notFound } from "@/lib/api/errors";
import { endSessions } from "@/lib/auth/queries";
import type { Role } from "@/lib/auth/roles";
import type { Member } from "./types";

export const BCRYPT_COST = 10;

export type { Member } from "./types";

export async function listMembers(groupId: string): Promise<Member[]> {
  return db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .select("u.id as userId", "u.name", "u.email", "m.role", "m.created_at as joinedAt")
    .where("m.group_id", groupId)
    .orderByRaw("case m.role when 'organiser' then 0 when 'builder' then 1 else 2 end, u.name");
}

export async function findMember(groupId: string, userId: string): Promise<Member> {
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
    if ("remove" in change) {
      await trx("memberships").where({ group_id: groupId, user_id: userId }).delete();
      // Whatever the removed person had open (in this group or another) must sign in again.
      await endSessions(userId, trx);
    }
    else await trx("memberships").where({ group_id: groupId, user_id: userId }).update({ role: change.role });
  });
}

export async function findUserEmail(userId: string): Promise<string | null> {
  const row = await db("users").select("email").where({ id: userId }).first();
  return row?.email ?? null;
}

/** The group's people by name, for the ledger's person filter. */
export async function listGroupPeople(groupId: string) {
  return db("memberships as m").join("users as u", "u.id", "m.user_id").select("u.id", "u.name").where("m.group_id", groupId).orderBy("u.name") as Promise<{ id: string; name: string }[]>;
}
