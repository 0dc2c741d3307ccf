import { AppError } from "./errors";

// Checks every declared route makes before it reads anything (lib/api/endpoint.ts).

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Refuses a state-changing request a browser sent from another site. Browsers
 * say where a request came from in Sec-Fetch-Site (all current engines) and
 * Origin; "same-site" is refused too, because another port of the same host
 * (the upload service, say) is same-site but not us. A request with neither
 * header is not a browser's (curl, a script) and is judged by its cookie alone.
 */
export function assertSameOrigin(request: Request): void {
  if (SAFE_METHODS.has(request.method)) return;
  const site = request.headers.get("sec-fetch-site");
  if (site) {
    if (site === "same-origin" || site === "none") return;
    throw crossSite();
  }
  const origin = request.headers.get("origin");
  if (origin === null) return;
  if (origin !== ownOrigin(request)) throw crossSite();
}

function ownOrigin(request: Request): string {
  const url = new URL(request.url);
  const host = request.headers.get("host") ?? url.host;
  return `${url.protocol}//${host}`;
}

const crossSite = () =>
  new AppError("forbidden", "This request came from another site, so it was refused. Use Cantrove's own pages.");

/** JSON bodies must say so: a form or text/plain post (what another site can send without asking) is 415. */
export function assertJsonContent(request: Request, raw: string): void {
  if (raw.trim() === "") return;
  const type = (request.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
  if (type === "application/json" || /^application\/[\w.+-]+\+json$/.test(type)) return;
  throw new AppError("unsupported_media_type", "Send the request body as JSON (Content-Type: application/json).");
}

const SAFE_PATH = /^[A-Za-z][A-Za-z0-9]{0,40}(\.[A-Za-z0-9]{1,40}){0,4}$/;

/** PostgreSQL cannot store NUL in text, and no person types one: refuse it wherever it hides. */
export function assertNoNul(value: unknown, path = ""): void {
  if (typeof value === "string") {
    if (value.includes("\u0000")) {
      throw new AppError("invalid_input", "Some fields need another look.", {
        // A path is named only when it is one of ours in shape: a key someone made up is never echoed back.
        fields: { [SAFE_PATH.test(path) ? path : "_"]: "Remove the invisible NUL character from this text." },
      });
    }
  } else if (Array.isArray(value)) {
    value.forEach((item, i) => assertNoNul(item, path ? `${path}.${i}` : String(i)));
  } else if (value && typeof value === "object") {
    for (const [key, item] of Object.entries(value)) {
      assertNoNul(key, path);
      assertNoNul(item, path ? `${path}.${key}` : key);
    }
  }
}
