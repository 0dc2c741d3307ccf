/// <reference lib="webworker" />
// The service worker, built by @serwist/turbopack (app/serwist/[path]/route.ts)
// and registered only from signed-in pages (components/offline/offline-keeper.tsx).
//
// - Next's static files are precached (Serwist's precache manifest).
// - Signed-in pages: network first. Each answer that carries the signed-in
//   marker (app/(app)/layout.tsx, data-cantrove-person and -group) is kept in
//   that person's own cache for that group, and only there; with no signal the
//   page comes from the cache of the person signed in on this phone, never
//   anyone else's.
// - Pages without the marker (the public drive pages, sign-in) are never
//   cached: they always come from the network, so tallies are live.
// - GET /api answers: network first, kept only when the server marked the
//   answer as the current person's in their current group (x-cantrove-for,
//   x-cantrove-group, lib/api/endpoint.ts).
// - Map tiles: cache first, in the person's tile cache, OFFLINE_TILE_BUDGET at
//   most counting the warm-up's and the map's together.
// - Someone else (or the same person in another group) seen signed in on this
//   phone: every other cache goes at once. A sign-out or switch bumps
//   `generation`, so whatever was still on its way (a warm-up) is not kept.
// - Waiting entries (lib/offline/store.ts) are sent on Background Sync.

import { CacheFirst, ExpirationPlugin, Serwist, type PrecacheEntry, type RouteHandlerCallbackOptions, type SerwistGlobalConfig } from "serwist";
import { currentPerson, personCache, setPerson, type Person } from "@/lib/offline/store";
import { flushOwner, SYNC_TAG } from "@/lib/offline/send";
import { isPersonShape, offlinePageHtml } from "@/lib/offline/marker";
import { apiStrategy, becomes, currentGeneration, dropOtherPeople, KEPT_AT_HEADER, keepPage, signedOut, tileStrategy } from "@/lib/offline/worker-keep";
import { warm } from "@/lib/offline/worker-warm";

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}

declare const self: ServiceWorkerGlobalScope;

/**
 * A page opened inside the app (no full load) is fetched again for the offline copy only when the
 * copy is older than this: moving between tabs does not cost a second request per page. The copy
 * is the person's own (their cache), and is only shown with no signal.
 */
const KEEP_FRESH_MS = 2 * 60_000;

async function offlinePage(request: Request): Promise<Response> {
  const person = await currentPerson();
  const url = new URL(request.url);
  if (person && (url.pathname === "/home" || url.pathname === "/")) return Response.redirect(new URL(person.home, url.origin).href, 302);
  if (person) {
    const cache = await caches.open(personCache(person));
    const hit = (await cache.match(url.href)) ?? (await cache.match(url.origin + url.pathname, { ignoreSearch: true }));
    if (hit) return hit;
  }
  return new Response(offlinePageHtml(person !== null), { status: 503, headers: { "content-type": "text/html; charset=utf-8", "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'" } });
}

async function navigation({ request, event }: RouteHandlerCallbackOptions): Promise<Response> {
  const gen = currentGeneration();
  try {
    const response = await fetch(request);
    const url = new URL(request.url);
    (event as ExtendableEvent).waitUntil(keepPage(url.origin + url.pathname + url.search, response.clone(), gen).catch(() => undefined));
    return response;
  } catch {
    return offlinePage(request);
  }
}

const NO_SIGNAL = () => new Response(JSON.stringify({ error: { code: "offline", message: "No connection, and this was not saved on this phone." } }), { status: 503, headers: { "content-type": "application/json" } });

async function api(options: RouteHandlerCallbackOptions): Promise<Response> {
  const person = await currentPerson();
  if (!person) return fetch(options.request);
  try {
    return await apiStrategy(person).handle(options);
  } catch {
    return NO_SIGNAL();
  }
}

async function tile(options: RouteHandlerCallbackOptions): Promise<Response> {
  const person = await currentPerson();
  if (!person) return fetch(options.request);
  return tileStrategy(person).handle(options);
}

async function tell(message: unknown): Promise<void> {
  for (const client of await self.clients.matchAll({ type: "window" })) client.postMessage(message);
}

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  // A new worker waits until the person taps "Reload" (components/offline/update-prompt.tsx).
  skipWaiting: false,
  clientsClaim: true,
  navigationPreload: false,
  // Writes go straight to the network, never through this worker (the Service Worker static
  // routing API, where the browser has it): nothing here handles them, and the page's own queue
  // (lib/offline/send.ts) decides what waits.
  requestRules: [{ condition: { requestMethod: "POST" }, source: "network" }],
  runtimeCaching: [
    { matcher: ({ request, sameOrigin }) => sameOrigin && request.mode === "navigate", handler: navigation },
    {
      matcher: ({ request, url, sameOrigin }) => sameOrigin && request.method === "GET" && url.pathname.startsWith("/api/") && !url.pathname.startsWith("/api/auth/") && !url.pathname.startsWith("/api/uploadthing"),
      handler: api,
    },
    { matcher: ({ url, sameOrigin }) => sameOrigin && url.pathname.startsWith("/tiles/"), handler: tile },
    { matcher: ({ url, sameOrigin }) => sameOrigin && url.pathname.startsWith("/_next/static/"), handler: new CacheFirst({ cacheName: "cantrove-static", plugins: [new ExpirationPlugin({ maxEntries: 200 })] }) },
  ],
});

/** A page opened inside the app: kept for the offline copy unless this person's copy of it is fresh. */
async function keepVisited(path: string): Promise<void> {
  const person = await currentPerson();
  const gen = currentGeneration();
  const url = self.location.origin + path;
  if (person) {
    const copy = await (await caches.open(personCache(person))).match(url);
    const keptAt = Number(copy?.headers.get(KEPT_AT_HEADER) ?? 0);
    if (Date.now() - keptAt < KEEP_FRESH_MS) return;
  }
  const res = await fetch(url, { credentials: "same-origin" });
  if (res.redirected) return;
  // With a person on this phone, only their page (the marker) is kept; with none, the marker decides.
  await keepPage(url, res, gen, person ?? undefined);
}

self.addEventListener("message", (event) => {
  const data = event.data as { type?: string; person?: Partial<Person>; tileUrl?: string; force?: boolean } | null;
  // The same shapes the signed-in marker allows (lib/offline/marker.ts): ids for a cache name, a home path on this site.
  if (data?.type === "CANTROVE_PERSON" && isPersonShape(data.person)) {
    const person: Person = { id: data.person.id, group: data.person.group, home: data.person.home };
    event.waitUntil(
      becomes(person)
        .then(() => warm(person, data.tileUrl ?? "", data.force === true))
        .then(() => tell({ type: "CANTROVE_WARMED", at: Date.now() }))
        .catch(() => undefined),
    );
  } else if (data?.type === "CANTROVE_KEEP" && typeof (data as { path?: unknown }).path === "string") {
    const path = (data as { path: string }).path;
    // Only a path on this site (a page the person just opened inside the app); the marker decides whose cache.
    if (path.startsWith("/") && !path.startsWith("//")) event.waitUntil(keepVisited(path).catch(() => undefined));
  } else if (data?.type === "CANTROVE_SIGNED_OUT") {
    // First: whatever is still on its way for the person (a warm-up, an answer) is no longer kept.
    signedOut();
    event.waitUntil(dropOtherPeople(null).then(() => setPerson(null)));
  }
});

self.addEventListener("sync", (event) => {
  const e = event as ExtendableEvent & { tag: string };
  if (e.tag !== SYNC_TAG) return;
  e.waitUntil(
    (async () => {
      const person = await currentPerson();
      if (!person) return;
      const result = await flushOwner(person.id, person.group);
      await tell({ type: "CANTROVE_OUTBOX_CHANGED" });
      // Still waiting: the browser tries the sync again later.
      if (result && result.left > 0) throw new Error("entries still waiting");
    })(),
  );
});

serwist.addEventListeners();
