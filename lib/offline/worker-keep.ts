// What the service worker (app/sw.ts) keeps, and for whom. Every copy is filed
// under the person AND their group (lib/offline/store.ts), and checked before it is
// written: a page by its signed-in marker, an /api answer by the server's mark
// (x-cantrove-for, x-cantrove-group, lib/api/endpoint.ts), and either only while
// that person is still the one on this phone. `generation` is bumped by every
// sign-out and every change of person or group, so whatever was still on its way
// then (a slow answer, a warm-up) is dropped when it arrives.

import { CacheFirst, ExpirationPlugin, NetworkFirst, type SerwistPlugin } from "serwist";
import { currentPerson, isPersonalCache, personCache, personKey, samePerson, setLastWarmed, setPerson, setWantedTiles, tileCache, wantedTiles, type Person } from "./store";
import { OFFLINE_TILE_BUDGET, tilesOverBudget } from "./tiles";
import { ANSWER_FOR_HEADER, ANSWER_GROUP_HEADER, personMarker } from "./marker";

/** Answers from /api kept per person (the oldest go first past this). */
const API_ENTRIES = 150;
/** Pages kept per person. */
const PAGE_ENTRIES = 60;
/** The server's mark on every signed-in read: whose answer it is (lib/api/endpoint.ts). */
/** When this phone kept a page (the worker's own mark on its copy). */
export const KEPT_AT_HEADER = "x-cantrove-kept-at";

/**
 * Bumped whenever the person (or their group) on this phone changes, and on sign-out: anything
 * fetched before then (a page, an answer, a warm-up's tiles) is no longer kept when it arrives.
 */
let generation = 0;
export const currentGeneration = () => generation;
/** A sign-out on this phone: nothing still on its way for the person is kept. */
export function signedOut(): void {
  generation += 1;
}

/** The person on this phone now, as the pages last told (IndexedDB; the pages clear it on sign-out themselves). */
export async function stillCurrent(person: Person, gen: number): Promise<boolean> {
  return gen === generation && samePerson(await currentPerson(), person);
}

/** An answer the server marked as this person's in this group (a page's marker says the same for pages). */
export function answerIsFor(response: Response, person: Person): boolean {
  return response.headers.get(ANSWER_FOR_HEADER) === person.id && response.headers.get(ANSWER_GROUP_HEADER) === person.group;
}

/** Cache writes of one person's answers: only theirs, and only while they are still the one signed in. */
function ownAnswersOnly(person: Person): SerwistPlugin {
  return {
    handlerWillStart: async ({ state }) => {
      if (state) state.generation = generation;
    },
    cacheWillUpdate: async ({ response, state }) => {
      const gen = typeof state?.generation === "number" ? state.generation : -1;
      return response.ok && answerIsFor(response, person) && (await stillCurrent(person, gen)) ? response : null;
    },
    // Signed out or switched while the copy was being written: it goes again.
    cacheDidUpdate: async ({ cacheName, request, state }) => {
      const gen = typeof state?.generation === "number" ? state.generation : -1;
      if (!(await stillCurrent(person, gen))) await (await caches.open(cacheName)).delete(request);
    },
  };
}

/** Past the budget, the oldest tiles not chosen for the person's runs go (lib/offline/tiles.ts). */
function tileBudget(): SerwistPlugin {
  return { cacheDidUpdate: async ({ cacheName }) => trimTiles(cacheName) };
}

/** One person's pages and answers, whichever way they were kept (the expiration plugin counts only its own): the oldest go past the limit. */
export async function trimPersonal(person: Person): Promise<void> {
  const cache = await caches.open(personCache(person));
  const keys = await cache.keys();
  for (const req of keys.slice(0, Math.max(0, keys.length - (API_ENTRIES + PAGE_ENTRIES)))) await cache.delete(req);
}

export async function trimTiles(cacheName: string): Promise<void> {
  const cache = await caches.open(cacheName);
  const kept = (await cache.keys()).map((r) => r.url);
  if (kept.length <= OFFLINE_TILE_BUDGET) return;
  for (const url of tilesOverBudget(kept, new Set(await wantedTiles()))) await cache.delete(url);
}

const apiStrategies = new Map<string, NetworkFirst>();
const tileStrategies = new Map<string, CacheFirst>();

export function apiStrategy(person: Person): NetworkFirst {
  const key = personKey(person);
  let s = apiStrategies.get(key);
  if (!s) {
    s = new NetworkFirst({ cacheName: personCache(person), networkTimeoutSeconds: 8, plugins: [ownAnswersOnly(person), new ExpirationPlugin({ maxEntries: API_ENTRIES + PAGE_ENTRIES })] });
    apiStrategies.set(key, s);
  }
  return s;
}

export function tileStrategy(person: Person): CacheFirst {
  const key = personKey(person);
  let s = tileStrategies.get(key);
  if (!s) {
    s = new CacheFirst({ cacheName: tileCache(person), plugins: [tileBudget()] });
    tileStrategies.set(key, s);
  }
  return s;
}

/** Everyone else's caches go (another person, or the same person in another group); only `keep`'s (if any) stay. */
export async function dropOtherPeople(keep: Person | null): Promise<void> {
  const key = keep ? personKey(keep) : null;
  for (const name of await caches.keys()) {
    if (isPersonalCache(name) && (key === null || !name.endsWith(key))) await caches.delete(name);
  }
  for (const k of [...apiStrategies.keys()]) if (k !== key) apiStrategies.delete(k);
  for (const k of [...tileStrategies.keys()]) if (k !== key) tileStrategies.delete(k);
}

/** The person on this page is now the one this phone remembers; anyone else's copies are dropped. */
export async function becomes(person: Person): Promise<void> {
  const before = await currentPerson();
  if (!samePerson(before, person)) {
    generation += 1;
    await dropOtherPeople(person);
    await setLastWarmed(0);
    await setWantedTiles([]);
  }
  if (!samePerson(before, person) || before?.home !== person.home) await setPerson(person);
}

/**
 * Keeps a signed-in page in its own person's cache (read from the page's marker). `expected`: the
 * warm-up's or an in-app visit's person and generation; a page for anyone else then, or fetched
 * before a sign-out or switch, is not kept (and false is returned). A navigation (no `expected`)
 * was fetched before `gen`: kept only if no sign-out or switch came in between.
 */
export async function keepPage(url: string, response: Response, gen: number, expected?: Person): Promise<boolean> {
  if (!response.ok || response.type !== "basic" || !(response.headers.get("content-type") ?? "").includes("text/html")) return false;
  const html = await response.text();
  const marker = personMarker(html);
  if (!marker) return false; // not a signed-in page: never cached
  const person: Person = { id: marker.id, group: marker.group, home: marker.home };
  if (gen !== generation) return false;
  if (expected) {
    if (!samePerson(person, expected) || !(await stillCurrent(expected, gen))) return false;
  } else {
    await becomes(person);
  }
  const headers = new Headers(response.headers);
  headers.set(KEPT_AT_HEADER, String(Date.now()));
  const cache = await caches.open(personCache(person));
  await cache.put(url, new Response(html, { status: response.status, statusText: response.statusText, headers }));
  // Signed out or switched while it was written: not kept after all.
  if (!(await stillCurrent(person, expected ? gen : generation))) {
    await cache.delete(url);
    return false;
  }
  await trimPersonal(person);
  return true;
}
