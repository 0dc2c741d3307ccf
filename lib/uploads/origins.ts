// Where uploaded files live, read from the environment only (no server-only
// import), so the CSP code, the upload callback and the stack can share it.
//
// Files should be served from an origin of their own, on a different site
// from the app, so a file can never run as the app or ride its cookies.

type Env = Record<string, string | undefined>;

function originOf(value: string | undefined): string | null {
  if (!value) return null;
  try {
    const url = new URL(value);
    return url.protocol === "http:" || url.protocol === "https:" ? url.origin : null;
  } catch {
    return null; // a malformed value is reported by lib/env.ts at boot
  }
}

function appIdOf(token: string | undefined): string | null {
  if (!token) return null;
  try {
    const appId = JSON.parse(atob(token)).appId;
    return typeof appId === "string" && /^[a-z0-9-]+$/i.test(appId) ? appId : null;
  } catch {
    return null;
  }
}

/**
 * The origins uploaded files are served from: `UPLOAD_ORIGIN` when set, else the upload
 * service's own origin (`UPLOADTHING_INGEST_URL`, the local fake), else the
 * hosted service's per-app file host (from memory: https://<appId>.ufs.sh).
 */
export function uploadFileOrigins(env: Env = process.env): string[] {
  const configured = originOf(env.UPLOAD_ORIGIN);
  if (configured) return [configured];
  const ingest = originOf(env.UPLOADTHING_INGEST_URL);
  if (ingest) return [ingest];
  const appId = appIdOf(env.UPLOADTHING_TOKEN);
  return appId ? [`https://${appId}.ufs.sh`] : [];
}

/** Where the browser sends the file bytes (the signed PUT). */
export function uploadIngestOrigins(env: Env = process.env): string[] {
  const ingest = originOf(env.UPLOADTHING_INGEST_URL);
  // The hosted service picks a regional ingest host per upload (from memory).
  return ingest ? [ingest] : ["https://*.ingest.uploadthing.com"];
}

/** For the CSP: `img-src` gets `img`, `connect-src` gets `connect`. */
export function uploadOrigins(env: Env = process.env): { img: string[]; connect: string[] } {
  return { img: uploadFileOrigins(env), connect: [...new Set([...uploadIngestOrigins(env), ...uploadFileOrigins(env)])] };
}

/** True when a file URL the upload service reported points at one of our file origins. */
export function isUploadFileUrl(value: string, env: Env = process.env): boolean {
  const origin = originOf(value);
  return !!origin && uploadFileOrigins(env).includes(origin);
}
