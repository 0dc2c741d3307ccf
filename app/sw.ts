/// <reference lib="webworker" />
// The service worker, built by @serwist/turbopack (app/serwist/[path]/route.ts)
// and registered only from signed-in pages (components/offline/offline-keeper.tsx).
//
// - Next's static files are precached (Serwist's precache manifest).
// - Signed-in pages: network first. Each answer that carries the signed-in
//   marker (app/(app)/layout.tsx, data-cantrove-person) is kept in that
//   person's own cache, and only there; with no signal the page comes from
//   the cache of the person signed in on this phone, never anyone else's.
// - Pages without the marker (the public drive pages, sign-in) are never
//   cached: they always come from the network, so tallies are live.
// - GET /api answers: network first, kept in the signed-in person's cache.
// - Map tiles: cache first, in the person's tile cache, OFFLINE_TILE_BUDGET at most.
// - Someone else seen signed in on this phone: every other person's caches go at once.
// - Waiting entries (lib/offline/store.ts) are sent on Background Sync.

import { CacheFirst, ExpirationPlugin, NetworkFirst, Serwist, type PrecacheEntry, type RouteHandlerCallbackOptions, type SerwistGlobalConfig } from "serwist";
import { currentPerson, isPersonalCache, lastWarmed, personCache, setLastWarmed, setPerson, tileCache, type Person } from "@/lib/offline/store";
import { flushOwner, SYNC_TAG } from "@/lib/offline/send";
import { OFFLINE_TILE_BUDGET, offlineTiles, tileUrl } from "@/lib/offline/tiles";
import { offlinePageHtml, personMarker } from "@/lib/offline/marker";

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}

declare const self: ServiceWorkerGlobalScope;

/** Answers from /api kept per person (the oldest go first past this). */
const API_ENTRIES = 150;
/** Pages kept per person. */
const PAGE_ENTRIES = 60;
/** The offline copies are refreshed at most this often by the signed-in pages' hello. */
const WARM_EVERY_MS = 5 * 60_000;
const MAX_RUNS = 10;

const apiStrategies = new Map<string, NetworkFirst>();
const tileStrategies = new Map<string, CacheFirst>();

function apiStrategy(id: string): NetworkFirst {
  let s = apiStrategies.get(id);
  if (!s) {
    s = new NetworkFirst({ cacheName: personCache(id), networkTimeoutSeconds: 8, plugins: [new ExpirationPlugin({ maxEntries: API_ENTRIES + PAGE_ENTRIES })] });
    apiStrategies.set(id, s);
  }
  return s;
}

function tileStrategy(id: string): CacheFirst {
  let s = tileStrategies.get(id);
  if (!s) {
    s = new CacheFirst({ cacheName: tileCache(id), plugins: [new ExpirationPlugin({ maxEntries: OFFLINE_TILE_BUDGET })] });
    tileStrategies.set(id, s);
  }
  return s;
}

/** Everyone else's caches go; only `keep` (if any) stays. */
async function dropOtherPeople(keep: string | null): Promise<void> {
  for (const name of await caches.keys()) {
    if (isPersonalCache(name) && (keep === null || !name.endsWith(keep))) await caches.delete(name);
  }
  for (const id of [...apiStrategies.keys()]) if (id !== keep) apiStrategies.delete(id);
  for (const id of [...tileStrategies.keys()]) if (id !== keep) tileStrategies.delete(id);
}

/** The person on this page is now the one this phone remembers; anyone else's copies are dropped. */
async function becomes(person: Person): Promise<void> {
  const before = await currentPerson();
  if (before?.id !== person.id) {
    await dropOtherPeople(person.id);
    await setLastWarmed(0);
  }
  if (before?.id !== person.id || before.home !== person.home) await setPerson(person);
}

/** Keeps a signed-in page in its own person's cache (read from the page's marker). */
async function keepPage(url: string, response: Response): Promise<void> {
  if (!response.ok || response.type !== "basic" || !(response.headers.get("content-type") ?? "").includes("text/html")) return;
  const html = await response.text();
  const marker = personMarker(html);
  if (!marker) return; // not a signed-in page: never cached
  await becomes({ id: marker.id, home: marker.home });
  const cache = await caches.open(personCache(marker.id));
  await cache.put(url, new Response(html, { status: response.status, statusText: response.statusText, headers: response.headers }));
}

async function offlinePage(request: Request): Promise<Response> {
  const person = await currentPerson();
  const url = new URL(request.url);
  if (person && (url.pathname === "/home" || url.pathname === "/")) return Response.redirect(new URL(person.home, url.origin).href, 302);
  if (person) {
    const cache = await caches.open(personCache(person.id));
    const hit = (await cache.match(url.href)) ?? (await cache.match(url.origin + url.pathname, { ignoreSearch: true }));
    if (hit) return hit;
  }
  return new Response(offlinePageHtml(person !== null), { status: 503, headers: { "content-type": "text/html; charset=utf-8", "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'" } });
}

async function navigation({ request, event }: RouteHandlerCallbackOptions): Promise<Response> {
  try {
    const response = await fetch(request);
    const url = new URL(request.url);
    (event as ExtendableEvent).waitUntil(keepPage(url.origin + url.pathname + url.search, response.clone()).catch(() => undefined));
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
    return await apiStrategy(person.id).handle(options);
  } catch {
    return NO_SIGNAL();
  }
}

async function tile(options: RouteHandlerCallbackOptions): Promise<Response> {
  const person = await currentPerson();
  if (!person) return fetch(options.request);
  return tileStrategy(person.id).handle(options);
}

interface RunJson {
  id: string;
  assigneeId: string | null;
  state: string;
  plannedOn: string;
}
interface RunDetailJson {
  start: { lat: number; lng: number };
  stopList: Array<{ dropPoint: { lat: number; lng: number } }>;
}

/**
 * After a signed-in page says hello: the person's home, /log and their runs,
 * each upcoming run of theirs (page and answer) and the map tiles around its
 * stops are fetched and kept, so a cold start with no signal has them.
 */
async function warm(person: Person, template: string, force: boolean): Promise<void> {
  if (!force && Date.now() - (await lastWarmed()) < WARM_EVERY_MS) return;
  await setLastWarmed(Date.now());
  const origin = self.location.origin;
  const page = async (path: string) => {
    const res = await fetch(new URL(path, origin), { credentials: "same-origin", redirect: "follow" });
    if (res.redirected) return; // /home, or a page this person may not open
    await keepPage(origin + path, res);
  };
  const json = async <T,>(path: string): Promise<T | null> => {
    const res = await fetch(new URL(path, origin), { credentials: "same-origin", headers: { accept: "application/json" } });
    if (!res.ok) return null;
    const cache = await caches.open(personCache(person.id));
    await cache.put(origin + path, res.clone());
    return (await res.json()) as T;
  };
  for (const path of new Set([person.home, "/log", "/runs"])) await page(path).catch(() => undefined);
  const runs = (await json<RunJson[]>("/api/runs").catch(() => null)) ?? [];
  const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
  const upcoming = runs.filter((r) => r.assigneeId === person.id && r.state !== "done" && r.plannedOn >= yesterday).slice(0, MAX_RUNS);
  const places: Array<Array<{ lat: number; lng: number }>> = [];
  for (const run of upcoming) {
    await page(`/runs/${run.id}`).catch(() => undefined);
    const detail = await json<RunDetailJson>(`/api/runs/${run.id}`).catch(() => null);
    if (detail) places.push([detail.start, ...detail.stopList.map((s) => s.dropPoint)]);
  }
  // Only tiles from this site: another tile server's answers are opaque and of unknown size.
  if (!template.startsWith("/")) return;
  const cache = await caches.open(tileCache(person.id));
  for (const t of offlineTiles(places)) {
    const url = origin + tileUrl(template, t);
    if (await cache.match(url)) continue;
    const res = await fetch(url).catch(() => null);
    if (res?.ok) await cache.put(url, res);
  }
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

self.addEventListener("message", (event) => {
  const data = event.data as { type?: string; person?: Person; tileUrl?: string; force?: boolean } | null;
  // The same shapes the signed-in marker allows (lib/offline/marker.ts): an id for a cache name, a home path on this site.
  if (data?.type === "CANTROVE_PERSON" && data.person && /^[0-9a-f-]{36}$/.test(String(data.person.id)) && /^\/[a-z]+$/.test(String(data.person.home))) {
    const person = { id: data.person.id, home: data.person.home };
    event.waitUntil(
      becomes(person)
        .then(() => warm(person, data.tileUrl ?? "", data.force === true))
        .then(() => tell({ type: "CANTROVE_WARMED", at: Date.now() }))
        .catch(() => undefined),
    );
  } else if (data?.type === "CANTROVE_KEEP" && typeof (data as { path?: unknown }).path === "string") {
    const path = (data as { path: string }).path;
    // Only a path on this site (a page the person just opened inside the app); the marker decides whose cache.
    if (path.startsWith("/") && !path.startsWith("//")) {
      event.waitUntil(
        fetch(new URL(path, self.location.origin), { credentials: "same-origin" })
          .then((res) => (res.redirected ? undefined : keepPage(self.location.origin + path, res)))
          .catch(() => undefined),
      );
    }
  } else if (data?.type === "CANTROVE_SIGNED_OUT") {
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
      const result = await flushOwner(person.id);
      await tell({ type: "CANTROVE_OUTBOX_CHANGED" });
      // Still waiting: the browser tries the sync again later.
      if (result && result.left > 0) throw new Error("entries still waiting");
    })(),
  );
});

serwist.addEventListeners();
