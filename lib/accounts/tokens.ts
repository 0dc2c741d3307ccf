import { toSlug } from "@/lib/slug";
import { createHash, randomBytes } from "node:crypto";
import type { Knex } from "knex";
import type { Tables } from "knex/types/tables";

// A link token is 32 random bytes; only its SHA-256 is stored.
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** A mailed link's row (password reset, address proof) while it still works: unused and unexpired, locked until the transaction ends. */
export function openLinkRow(trx: Knex.Transaction, table: "password_resets" | "email_verifications", token: string): Promise<Tables["password_resets"] | undefined> {
  return trx<Tables["password_resets"]>(table).where({ token_hash: hashToken(token) }).whereNull("used_at").andWhere("expires_at", ">", trx.fn.now()).forUpdate().first();
}

export const INVITATION_DAYS = 7;
export const RESET_MINUTES = 60;

/** A URL-safe group slug from its name, with a short suffix to keep it unique. */
export function slugify(name: string, suffix: string): string {
  const base = toSlug(name, 48);
  return `${base || "group"}-${suffix}`;
}

export const VERIFY_HOURS = 48;
