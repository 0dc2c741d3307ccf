import "server-only";
import type { Resolver } from "@/lib/api/endpoint";
import { createHash, randomBytes } from "node:crypto";
import { conflict, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/queries";
import { db } from "@/lib/db";
import type { PledgeStatus } from "./schemas";

// A pledge's life (issue 16): pledged → cancelled (by the donor, from the
// mail's link) or received / not brought (by the organiser). Only the token's
// SHA-256 is stored, so a copy of the database cannot cancel anyone's pledge.

/** A fresh unguessable cancel token (256 random bits) and the hash kept for it. */
export function newCancelToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export interface PledgeByToken {
  id: string;
  bags: number;
  bringOn: string;
  status: PledgeStatus;
  pointName: string;
  driveName: string;
  driveSlug: string;
}

/** The pledge a cancel link names, for the page that asks to confirm; undefined when the token names none. */
export async function pledgeByToken(token: string): Promise<PledgeByToken | undefined> {
  return db("pledges as pl")
    .join("drop_points as p", "p.id", "pl.drop_point_id")
    .join("drives as d", "d.id", "pl.drive_id")
    .where("pl.cancel_token_hash", hashToken(token))
    .first("pl.id", "pl.bags", db.raw(`to_char(pl.bring_on, 'YYYY-MM-DD') as "bringOn"`), "pl.status", "p.name as pointName", "d.name as driveName", "d.slug as driveSlug");
}

/** The donor's cancellation: 404 for a token that names no pledge, 409 once the pledge is no longer open. */
export async function cancelPledgeByToken(token: string) {
  const [row] = await db("pledges")
    .where({ cancel_token_hash: hashToken(token), status: "pledged" })
    .update({ status: "cancelled", status_at: db.fn.now() })
    .returning(["id", "status"]);
  if (row) return { id: row.id as string, status: row.status as PledgeStatus };
  const found = await db("pledges").where({ cancel_token_hash: hashToken(token) }).first("status");
  if (!found) throw notFound("That pledge");
  throw conflict(found.status === "cancelled" ? "That pledge is already cancelled." : "That pledge has already been recorded by the organisers; it can no longer be cancelled.", {
    status: found.status,
  });
}

/**
 * The organiser's mark: received (optionally with the haul that brought it, a
 * haul of the same drop point), not brought, or back to pledged. A cancelled
 * pledge stays cancelled (409). Another group's pledge or haul is 404.
 */
export async function markPledge(actor: Actor, id: string, status: Exclude<PledgeStatus, "cancelled">, haulId?: string) {
  const groupId = actor.group.id;
  return db.transaction(async (trx) => {
    const pledge = await trx("pledges").where({ id, group_id: groupId }).forUpdate().first("id", "status", "drop_point_id", "drive_id");
    if (!pledge) throw notFound("That pledge");
    if (pledge.status === "cancelled") throw conflict("The donor cancelled this pledge; it cannot be marked.", { status: pledge.status });
    if (haulId) {
      if (status !== "received") throw conflict("Only a received pledge names the haul that brought it.");
      const haul = await trx("hauls").where({ id: haulId, group_id: groupId }).whereNull("reversed_at").first("drop_point_id", "drive_id");
      if (!haul) throw notFound("That haul");
      if (haul.drop_point_id !== pledge.drop_point_id) throw conflict("That haul was from another drop point than the pledge.");
    }
    const [row] = await trx("pledges")
      .where({ id, group_id: groupId })
      .update({ status, status_at: status === "pledged" ? null : trx.fn.now(), haul_id: status === "received" ? (haulId ?? null) : null })
      .returning(["id", "status", "haul_id as haulId"]);
    return row as { id: string; status: PledgeStatus; haulId: string | null };
  });
}

/** The route's resource: the acting group's pledge, else 404 before anything about the body is said. */
export const ownPledge: Resolver<{ id: string }, { id: string }> = async (actor, { id }) => {
  const row = await db("pledges").where({ id, group_id: actor.group.id }).first("id");
  if (!row) throw notFound("That pledge");
  return row;
};
