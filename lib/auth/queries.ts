import "server-only";
import { db } from "@/lib/db";
import type { Role } from "./roles";

export interface Actor {
  user: { id: string; email: string; name: string };
  group: { id: string; slug: string; name: string };
  role: Role;
}

export async function findUserForSignIn(email: string) {
  return db("users").select("id", "email", "name", "password_hash").where({ email }).first();
}

/** The person's membership in one group, or their first one when no group is asked for. */
export async function loadActor(userId: string, groupId?: string | null): Promise<Actor | null> {
  const row = await db("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .join("groups as g", "g.id", "m.group_id")
    .select("u.id as userId", "u.email", "u.name as userName", "g.id as groupId", "g.slug", "g.name as groupName", "m.role")
    .where("m.user_id", userId)
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
  };
}

export async function listMemberships(userId: string) {
  return db("memberships as m")
    .join("groups as g", "g.id", "m.group_id")
    .select("g.id", "g.slug", "g.name", "m.role")
    .where("m.user_id", userId)
    .orderBy("g.name");
}
