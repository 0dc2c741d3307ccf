// The signed-in marker every signed-in page carries (app/(app)/layout.tsx): whose
// page it is, their home and when it was made. The service worker reads it to
// keep the page in that person's own cache; the offline notice reads the time.

/**
 * The headers naming whose answer an /api read is (set by lib/api/endpoint.ts on every signed-in
 * read; the worker keeps an answer only for the person and group they name: lib/offline/worker-keep.ts).
 */
export const ANSWER_FOR_HEADER = "x-cantrove-for";
export const ANSWER_GROUP_HEADER = "x-cantrove-group";

const ID = /^[0-9a-f-]{36}$/;
const HOME = /^\/[a-z]+$/;
const MARKER = /data-cantrove-person="([0-9a-f-]{36})" data-cantrove-group="([0-9a-f-]{36})" data-cantrove-home="(\/[a-z]+)" data-rendered-at="([0-9T:.Z-]+)"/;

export interface Marker {
  id: string;
  /** The person's active group: what is kept offline is filed under the person and this group. */
  group: string;
  home: string;
  renderedAt: string;
}

export function markerAttributes(m: Marker): Record<string, string> {
  if (!ID.test(m.id) || !ID.test(m.group) || !HOME.test(m.home)) throw new Error("bad marker");
  return { "data-cantrove-person": m.id, "data-cantrove-group": m.group, "data-cantrove-home": m.home, "data-rendered-at": m.renderedAt };
}

/** The shapes a person on this phone may have (a cache name is made from the ids). */
export function isPersonShape(p: { id?: unknown; group?: unknown; home?: unknown } | null | undefined): p is { id: string; group: string; home: string } {
  return !!p && ID.test(String(p.id)) && ID.test(String(p.group)) && HOME.test(String(p.home));
}

/** The marker in a page's HTML, or null for a page that has none (public pages). */
export function personMarker(html: string): Marker | null {
  const m = MARKER.exec(html);
  return m ? { id: m[1], group: m[2], home: m[3], renderedAt: m[4] } : null;
}

/** What a page not saved on this phone shows with no signal: plain HTML, no script. */
export function offlinePageHtml(signedIn: boolean): string {
  const links = signedIn
    ? '<p>Pages you opened while online are kept on this phone: <a href="/log">Log</a> · <a href="/runs">Pickup runs</a>.</p>'
    : "<p>Sign in while you have a connection; then Log and your pickup runs open here without one.</p>";
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>No connection · Cantrove</title>
<style>body{font:18px/1.5 system-ui,sans-serif;background:#fbf7f0;color:#1f1b16;margin:0;padding:24px;max-width:36rem}a{color:#7f3011;display:inline-block;min-height:44px;padding:8px 0}</style></head>
<body><main><h1>No connection</h1><p>This page was not saved on this phone.</p>${links}</main></body></html>`;
}
