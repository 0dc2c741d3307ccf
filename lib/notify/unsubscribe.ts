import "server-only";
import { createHmac, timingSafeEqual } from "node:crypto";
import { env } from "@/lib/env";
import { NOTIFICATION_KINDS, type NotificationKind } from "./kinds";

// One-click unsubscribe (RFC 8058). The link names the person and the kind and
// carries an HMAC-SHA256 of both under the server's secret, so it cannot be
// guessed or altered, needs no table, and every app server checks it alike.
// Changing NEXTAUTH_SECRET retires every link already mailed (the settings
// page still works).

function signature(userHex: string, kind: string): string {
  return createHmac("sha256", env().NEXTAUTH_SECRET).update(`cantrove-unsubscribe:${userHex}:${kind}`).digest("base64url");
}

export function unsubscribeToken(userId: string, kind: NotificationKind): string {
  const userHex = userId.replaceAll("-", "").toLowerCase();
  return `${userHex}.${kind}.${signature(userHex, kind)}`;
}

/** The person and kind a token stands for, or null when it is not one we signed. */
export function readUnsubscribeToken(token: string): { userId: string; kind: NotificationKind } | null {
  const [userHex, kind, sig] = token.split(".");
  if (!userHex || !kind || !sig || !/^[0-9a-f]{32}$/.test(userHex)) return null;
  if (!(NOTIFICATION_KINDS as readonly string[]).includes(kind)) return null;
  const expected = Buffer.from(signature(userHex, kind));
  const given = Buffer.from(sig);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  const userId = `${userHex.slice(0, 8)}-${userHex.slice(8, 12)}-${userHex.slice(12, 16)}-${userHex.slice(16, 20)}-${userHex.slice(20)}`;
  return { userId, kind: kind as NotificationKind };
}

/**
 * The app's base URL as an https URL. RFC 8058 §3.1: the List-Unsubscribe field
 * "MUST contain one HTTPS URI"; a deployment terminates TLS in front of APP_URL's
 * host. (The local stack has no TLS: its tests reach the same path over http.)
 */
function httpsBase(): string {
  const url = new URL(env().APP_URL);
  url.protocol = "https:";
  return url.origin;
}

export function unsubscribeUrls(userId: string, kind: NotificationKind) {
  const token = unsubscribeToken(userId, kind);
  const app = env().APP_URL.replace(/\/$/, "");
  return {
    /** For the header: POST unsubscribes at once (one click), GET shows the confirm page. */
    oneClick: `${httpsBase()}/api/unsubscribe/${token}`,
    /** For the e-mail's text: the confirm page on the app's own address. */
    page: `${app}/unsubscribe/${token}`,
    settings: `${app}/account`,
  };
}

/** RFC 8058 §3.1 and RFC 2369 §3.2: the URI in angle brackets, and the one key/value pair for the POST. */
export function unsubscribeHeaders(userId: string, kind: NotificationKind): Record<string, string> {
  return {
    "List-Unsubscribe": `<${unsubscribeUrls(userId, kind).oneClick}>`,
    "List-Unsubscribe-Post": "List-Unsubscribe=One-Click",
  };
}
