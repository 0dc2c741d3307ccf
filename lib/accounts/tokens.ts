import { toSlug } from "@/lib/slug";
import { createHash, randomBytes } from "node:crypto";

// A link token is 32 random bytes; only its SHA-256 is stored.
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export const INVITATION_DAYS = 7;
export const RESET_MINUTES = 60;

/** A URL-safe group slug from its name, with a short suffix to keep it unique. */
export function slugify(name: string, suffix: string): string {
  const base = toSlug(name, 48);
  return `${base || "group"}-${suffix}`;
}

export const VERIFY_HOURS = 48;
