// Safe to import anywhere: no I/O. Where a sign-in may send the browser next.
//
// Only a path on this site: one leading "/", never "//" or "/\" (browsers read
// both as "another host follows"), no backslash or control character anywhere
// (browsers drop or rewrite them, which can turn a path into a host).

const UNSAFE = /[\\\u0000-\u001f\u007f]/;

export function isSafePath(target: unknown): target is string {
  if (typeof target !== "string" || !target.startsWith("/") || target.startsWith("//")) return false;
  if (UNSAFE.test(target)) return false;
  // Belt and braces: resolved against any origin it must stay on that origin.
  try {
    return new URL(target, "https://cantrove.invalid").origin === "https://cantrove.invalid";
  } catch {
    return false;
  }
}

/** The target when it is a safe path on this site, else the fallback (the person's home, or "/"). */
export function safeRedirect(target: unknown, fallback = "/"): string {
  return isSafePath(target) ? target : isSafePath(fallback) ? fallback : "/";
}

/**
 * For next-auth's `redirect` callback: a path or an absolute URL on baseUrl's
 * origin is kept, anything else (another host, a malformed URL) goes to baseUrl.
 */
export function safeCallbackUrl(url: string, baseUrl: string): string {
  const origin = new URL(baseUrl).origin;
  if (isSafePath(url)) return `${origin}${url}`;
  try {
    const parsed = new URL(url);
    const path = `${parsed.pathname}${parsed.search}${parsed.hash}`;
    if (parsed.origin === origin && isSafePath(path)) return `${origin}${path}`;
  } catch {
    // Not a URL at all: home.
  }
  return baseUrl;
}

/** The callbackUrl to keep: itself when it is a safe path or a safe URL on one of the origins, else "/". */
export function keptCallbackUrl(url: string, origins: string[]): string {
  if (isSafePath(url)) return url;
  try {
    const parsed = new URL(url);
    if (origins.includes(parsed.origin) && isSafePath(`${parsed.pathname}${parsed.search}${parsed.hash}`)) return url;
  } catch {
    // Not a URL at all.
  }
  return "/";
}
