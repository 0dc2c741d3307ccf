import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import type { Role } from "./roles";
import type { Membership } from "@/lib/accounts/types";

export interface Actor {
  user: { id: string; email: string; name: string };
  group: { id: string; slug: string; name: string };
  role: Role;
}

/** With users.session_version: a session whose token carries another number is over. */
export type LoadedActor = Actor & { sessionVersion: number };

export async function findUserForSignIn(email: string) {
  return db("users").select("id", "email", "name", "password_hash", "email_verified_at", "session_version").where({ email }).first();
}

/** The person's membership in one group, or their first one when no group is asked for. */
export async function loadActor(userId: string, groupId?: string | null): Promise<LoadedActor | null> {
  const row = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .join("groups as g", "g.id", "m.group_id")
    .select("u.id as userId", "u.email", "u.name as userName", "g.id as groupId", "g.slug", "g.name as groupName", "m.role", "u.session_version as sessionVersion")
    .where("m.user_id", userId)
    // An address nobody has proven never acts in a group.
    .whereNotNull("u.email_verified_at")
    .modify((q) => {
      if (groupId) q.andWhere("m.group_id", groupId);
    })
    .orderBy("m.created_at", "asc")
    .first();
  if (!row) return null;
  return {
    user: { id: row.userId, email: row.email, name: row.userName },
    group: { id: row.groupId, slug: row.slug, name: row.groupName },
    role: row.role as Role,
    sessionVersion: row.sessionVersion,
  };
}

export async function listMemberships(userId: string): Promise<Membership[]> {
  return db("memberships as m")
    .join("groups as g", "g.id", "m.group_id")
    .select("g.id", "g.slug", "g.name", "m.role")
    .where("m.user_id", userId)
    .orderBy("g.name");
}

/** The session version of a person whose address is proven; null when there is no such person. */
export async function loadSessionVersion(userId: string): Promise<number | null> {
  const row = await db("users").select("session_version").where({ id: userId }).whereNotNull("email_verified_at").first();
  return row ? row.session_version : null;
}

/** Ends every session of a person (inside the caller's transaction when given). */
export async function endSessions(userId: string, trx: Knex | Knex.Transaction = db): Promise<void> {
  await trx("users").where({ id: userId }).increment("session_version", 1);
}
