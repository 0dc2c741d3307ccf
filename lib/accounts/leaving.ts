import "server-only";
import type { Knex } from "knex";
import { db } from "@/lib/db";
import { conflict, notFound } from "@/lib/api/errors";
import { endSessions } from "@/lib/auth/queries";
import type { HandOverInput } from "./schemas";

// Leaving a group and handing it over (issue 16). Both lock the group's
// organiser rows first, as updateMembership does, so two organisers leaving at
// once cannot leave the group with none.

export const LAST_ORGANISER_LEAVING =
  "You are this group's only organiser, so you cannot leave yet. Hand the organiser role to another member first (Members page, \u201cHand over\u201d).";

async function lockOrganisers(trx: Knex.Transaction, groupId: string): Promise<string[]> {
  return trx("memberships").where({ group_id: groupId, role: "organiser" }).forUpdate().pluck("user_id");
}

/**
 * The person leaves the group. Their sessions end (endSessions bumps the
 * version every session carries), so whatever they had open for this group
 * stops at its next request; their other groups stay theirs after signing in
 * again. What they recorded stays in the ledger under their name.
 */
export async function leaveGroup(groupId: string, userId: string): Promise<{ left: true; groupsLeft: number }> {
  return db.transaction(async (trx) => {
    const organisers = await lockOrganisers(trx, groupId);
    const member = await trx("memberships").where({ group_id: groupId, user_id: userId }).forUpdate().first();
    if (!member) throw notFound("That membership");
    if (member.role === "organiser" && organisers.length <= 1) throw conflict(LAST_ORGANISER_LEAVING, { rule: "last_organiser" });
    await trx("memberships").where({ group_id: groupId, user_id: userId }).delete();
    // Pickup runs given to them that are not done go back to the organisers to give again.
    await trx("pickup_runs").where({ group_id: groupId, assignee_id: userId }).whereNotIn("state", ["done", "cancelled"]).update({ assignee_id: null });
    await endSessions(userId, trx);
    const [{ count }] = await trx("memberships").where({ user_id: userId }).count<{ count: number }[]>({ count: "*" });
    return { left: true as const, groupsLeft: Number(count) };
  });
}

/**
 * An organiser makes another member of the same group an organiser and then
 * becomes a volunteer or builder, or leaves. The other member must belong to
 * the group (404 otherwise, another group's person included); handing over to
 * oneself is 409.
 */
export async function handOver(groupId: string, fromUserId: string, toUserId: string, input: HandOverInput): Promise<{ organiser: string; then: HandOverInput["then"] }> {
  return db.transaction(async (trx) => {
    await lockOrganisers(trx, groupId);
    if (fromUserId === toUserId) throw conflict("Choose another member: you are the organiser already.", { rule: "hand_over_to_self" });
    const target = await trx("memberships").where({ group_id: groupId, user_id: toUserId }).forUpdate().first();
    if (!target) throw notFound("That member");
    const me = await trx("memberships").where({ group_id: groupId, user_id: fromUserId }).forUpdate().first();
    if (!me || me.role !== "organiser") throw conflict("Only an organiser can hand the group over.", { rule: "not_organiser" });
    await trx("memberships").where({ group_id: groupId, user_id: toUserId }).update({ role: "organiser" });
    if (input.then === "leave") {
      await trx("memberships").where({ group_id: groupId, user_id: fromUserId }).delete();
      await trx("pickup_runs").where({ group_id: groupId, assignee_id: fromUserId }).whereNotIn("state", ["done", "cancelled"]).update({ assignee_id: null });
      await endSessions(fromUserId, trx);
    } else {
      await trx("memberships").where({ group_id: groupId, user_id: fromUserId }).update({ role: input.then });
    }
    return { organiser: toUserId, then: input.then };
  });
}

export async function organiserCount(groupId: string): Promise<number> {
  const [{ count }] = await db("memberships").where({ group_id: groupId, role: "organiser" }).count<{ count: number }[]>({ count: "*" });
  return Number(count);
}
