/**
 * The Content-Security-Policy of every page, built per request with a nonce by
 * proxy.ts (the App Router way: Next reads the nonce from the request's CSP
 * header and puts it on its own scripts). Pure, so it is unit tested.
 *
 * Where uploads go and come from is read from the environment at run time:
 * the upload service's origins (UPLOADTHING_INGEST_URL, UPLOADTHING_API_URL), the file host (UPLOAD_ORIGIN)
 * and any further ones in CANTROVE_UPLOAD_ORIGINS (space-separated, e.g. a
 * hosted upload service or a separate file host). A loopback origin is kept
 * only in local mode — APP_URL itself on loopback, as `npm start` and
 * `npm test` run it — so a public deployment never trusts a port on its own
 * machine, and no policy ever allows every loopback port.
 */

type Env = Record<string, string | undefined>;

const LOOPBACK_HOSTS = new Set(["127.0.0.1", "localhost", "[::1]"]);

function originOf(value: string | undefined): URL | null {
  if (!value) return null;
  try {
    const url = new URL(value);
    return url.protocol === "http:" || url.protocol === "https:" ? url : null;
  } catch {
    // a malformed value is reported by lib/env.ts at boot
    return null;
  }
}

const isLoopback = (url: URL) => LOOPBACK_HOSTS.has(url.hostname);

/** Local mode: the app itself is served on loopback (`npm start`, `npm test`). */
export function isLocalMode(env: Env): boolean {
  const app = originOf(env.APP_URL ?? env.NEXTAUTH_URL);
  return app === null || isLoopback(app);
}

/** The exact origins the browser may send uploads to and show uploaded files from. */
export function uploadOrigins(env: Env): string[] {
  const local = isLocalMode(env);
  const values = [env.UPLOADTHING_INGEST_URL, env.UPLOADTHING_API_URL, env.UPLOAD_ORIGIN, ...(env.CANTROVE_UPLOAD_ORIGINS ?? "").split(/\s+/)];
  const origins = new Set<string>();
  for (const value of values) {
    const url = originOf(value);
    if (url && (local || !isLoopback(url))) origins.add(url.origin);
  }
  return [...origins];
}

/**
 * The policy with a `{nonce}` placeholder; built once per process because
 * the environment does not change while it runs.
 *
 * Scripts: only those carrying the nonce, and what they load ('strict-dynamic'
 * — Next's chunks, the map loaded on demand). Styles keep 'unsafe-inline':
 * React renders style attributes, Leaflet positions tiles with them and the
 * printable sign sets its paper size in a <style>; a style cannot run code.
 */
export function policyTemplate(env: Env): string {
  const uploads = uploadOrigins(env);
  const extra = uploads.length ? ` ${uploads.join(" ")}` : "";
  const dev = env.NODE_ENV === "development";
  const https = originOf(env.APP_URL)?.protocol === "https:";
  return [
    "default-src 'self'",
    // React's development build needs eval for its error overlays; production never does.
    `script-src 'self' 'nonce-{nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    `img-src 'self' data: blob:${extra}`,
    "font-src 'self' data:",
    `connect-src 'self'${extra}`,
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ].join("; ");
}

/** A fresh, unguessable nonce: a random UUID (122 random bits), base64 as the Next docs do. */
export function newNonce(): string {
  return btoa(crypto.randomUUID());
}

