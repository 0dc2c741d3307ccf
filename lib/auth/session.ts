import "server-only";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { authOptions } from "./options";
import { loadActor, type Actor } from "./queries";
import { AppError } from "@/lib/api/errors";
import type { Role } from "./roles";

// The role is read from the database on every call rather than trusted from
// the token, so a removed or demoted member loses access at once.
export async function getActor(): Promise<Actor | null> {
  const session = await getServerSession(authOptions);
  if (!session?.userId) return null;
  // Removed from the active group but still in another: carry on in that one.
  return (await loadActor(session.userId, session.groupId)) ?? (session.groupId ? loadActor(session.userId) : null);
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
