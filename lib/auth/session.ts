import "server-only";
import { getToken } from "next-auth/jwt";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { loadActor, loadSessionVersion, type Actor } from "./queries";
import { AppError } from "@/lib/api/errors";
import { cachedRead } from "@/lib/cache/read-cache";
import type { Role } from "./roles";
import { decodeSession } from "./session-token";

// The role is read from the database rather than trusted from the token, so a
// removed or demoted member loses access at once. The answer rides on the short
// read cache (lib/cache/read-cache.ts): every write through this server clears
// it, so a change of role or a removal bites on the next request here, and
// within READ_CACHE_MS (2 s) on other servers. The same read carries the
// person's session version, compared with the one in the token.
//
// The session cookie is read with next-auth's getToken: the same decryption and
// expiry check as getServerSession, without re-issuing the token on every call
// (route handlers cannot set the cookie anyway; the client's session refresh does).
// Only the cookie counts, never an Authorization header.
export async function getActor(): Promise<Actor | null> {
  const session = await readSession();
  if (!session) return null;
  const { userId, groupId, sessionVersion } = session;
  // Removed from the active group but still in another: carry on in that one.
  const load = async () => (await loadActor(userId, groupId)) ?? (groupId ? loadActor(userId) : null);
  const actor = await cachedRead(`actor:${userId}:${groupId ?? ""}`, load, "people");
  // A password change or reset, or a removal, bumped the version: this session is over.
  return actor && actor.sessionVersion === sessionVersion ? actor : null;
}

/** The signed-in person's id when the session is still current, even without any group. */
export async function getSessionUserId(): Promise<string | null> {
  const session = await readSession();
  if (!session) return null;
  const version = await cachedRead(`session:${session.userId}`, () => loadSessionVersion(session.userId), "people");
  return version === session.sessionVersion ? session.userId : null;
}

async function readSession(): Promise<{ userId: string; groupId: string | null; sessionVersion: number } | null> {
  const req = { cookies: await cookies(), headers: {} } as unknown as Parameters<typeof getToken>[0]["req"];
  const token = await getToken({ req, decode: decodeSession });
  const userId = typeof token?.userId === "string" && token.userId ? token.userId : null;
  if (!userId) return null;
  const groupId = typeof token?.groupId === "string" ? token.groupId : null;
  // Tokens issued before session versions existed carry none: they are over too.
  const sessionVersion = typeof token?.sessionVersion === "number" ? token.sessionVersion : -1;
  return { userId, groupId, sessionVersion };
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
