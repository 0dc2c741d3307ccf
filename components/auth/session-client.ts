"use client";

import { fetchJson } from "@/lib/api/client";

// next-auth's browser module is about 13 kB of compressed JavaScript, and its
// provider fetches the session as every signed-in page opens. Nothing on those
// pages reads the session in the browser (the server renders who is signed in),
// so the two things that change it load next-auth's module only when used.

/** Signs out and goes to `callbackUrl` (next-auth's own sign-out, loaded on the click). */
export async function signOutTo(callbackUrl: string): Promise<void> {
  const { signOut } = await import("next-auth/react");
  await signOut({ callbackUrl });
}

/**
 * Asks the server to rewrite the session cookie with `data` (next-auth's
 * session update: POST /api/auth/session with the CSRF token, which runs the
 * jwt callback with trigger "update"), as useSession().update does.
 */
export async function updateSession(data: Record<string, unknown>): Promise<void> {
  const { getCsrfToken } = await import("next-auth/react");
  const csrfToken = await getCsrfToken();
  await fetchJson("/api/auth/session", { method: "POST", body: { csrfToken, data } });
}
