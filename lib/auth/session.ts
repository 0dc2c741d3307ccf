import "server-only";
import { getToken } from "next-auth/jwt";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { loadActor, type Actor } from "./queries";
import { AppError } from "@/lib/api/errors";
import type { Role } from "./roles";

// The role is read from the database on every call rather than trusted from
// the token, so a removed or demoted member loses access at once.
//
// The session cookie is read with next-auth's getToken: the same decryption and
// expiry check as getServerSession, without re-issuing the token on every call
// (route handlers cannot set the cookie anyway; the client's session refresh does).
// Only the cookie counts, never an Authorization header.
export async function getActor(): Promise<Actor | null> {
  const token = await getToken({ req: { cookies: await cookies(), headers: {} } as unknown as Parameters<typeof getToken>[0]["req"] });
  const userId = typeof token?.userId === "string" && token.userId ? token.userId : null;
  if (!userId) return null;
  const groupId = typeof token?.groupId === "string" ? token.groupId : null;
  // Removed from the active group but still in another: carry on in that one.
  return (await loadActor(userId, groupId)) ?? (groupId ? loadActor(userId) : null);
}

export async function requireUser(): Promise<Actor> {
  const actor = await getActor();
  if (!actor) throw new AppError("unauthenticated", "Sign in to do that.");
  return actor;
}

export async function requireRole(...roles: Role[]): Promise<Actor> {
  const actor = await requireUser();
  if (!roles.includes(actor.role)) {
    throw new AppError("forbidden", `This needs the ${roles.join(" or ")} role; you are signed in as ${actor.role}.`);
  }
  return actor;
}

/** For pages: send visitors without a session to sign-in, and the wrong role to their own home. */
export async function requirePageRole(path: string, ...roles: Role[]): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect(`/signin?next=${encodeURIComponent(path)}`);
  if (roles.length && !roles.includes(actor.role)) redirect(`/forbidden?from=${encodeURIComponent(path)}`);
  return actor;
}
