// The worker's warm-up (app/sw.ts): after a signed-in page says hello, what a cold
// start with no signal needs is fetched and kept for that person in that group.

import { lastWarmed, personCache, setLastWarmed, setWantedTiles, tileCache, type Person } from "./store";
import { offlineTiles, tileUrl } from "./tiles";
import { answerIsFor, currentGeneration, keepPage, stillCurrent, trimPersonal, trimTiles } from "./worker-keep";

/** The offline copies are refreshed at most this often by the signed-in pages' hello. */
const WARM_EVERY_MS = 5 * 60_000;
const MAX_RUNS = 10;
/** Drives whose Log forms are made ready for a cold start (the group's current ones). */
const MAX_DRIVES = 6;

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

/** The person signed out or someone else signed in during a warm-up: the rest of it is dropped. */
class Superseded extends Error {}

/**
 * After a signed-in page says hello: the person's home, /log and their runs,
 * each upcoming run of theirs (page and answer) and the map tiles around its
 * stops are fetched and kept, so a cold start with no signal has them. Every
 * copy is checked before it is kept: for this person in this group, and
 * nobody signed out or switched since the warm-up began.
 */
export async function warm(person: Person, template: string, force: boolean): Promise<void> {
  const gen = currentGeneration();
  if (!force && Date.now() - (await lastWarmed()) < WARM_EVERY_MS) return;
  await setLastWarmed(Date.now());
  const origin = self.location.origin;
  const page = async (path: string) => {
    const res = await fetch(new URL(path, origin), { credentials: "same-origin", redirect: "follow" });
    if (res.redirected) return; // /home, or a page this person may not open
    if (!(await keepPage(origin + path, res, gen, person)) && !(await stillCurrent(person, gen))) throw new Superseded();
  };
  const json = async <T,>(path: string): Promise<T | null> => {
    const res = await fetch(new URL(path, origin), { credentials: "same-origin", headers: { accept: "application/json" } });
    if (!res.ok) return null;
    if (!answerIsFor(res, person) || !(await stillCurrent(person, gen))) throw new Superseded();
    const cache = await caches.open(personCache(person));
    await cache.put(origin + path, res.clone());
    if (!(await stillCurrent(person, gen))) {
      await cache.delete(origin + path);
      throw new Superseded();
    }
    await trimPersonal(person);
    return (await res.json()) as T;
  };
  const quietly = async <T,>(work: Promise<T>): Promise<T | null> => {
    try {
      return await work;
    } catch (error) {
      if (error instanceof Superseded) throw error;
      return null; // no signal for this one, or the server refused: the rest go on
    }
  };
  for (const path of new Set([person.home, "/log", "/runs"])) await quietly(page(path));
  // What the Log page's forms read when their tab opens (the hauls still to sort, the stock to
  // process), so each tab works on a cold start, not only after it was opened online.
  const drives = (await quietly(json<Array<{ id: string }>>("/api/drives"))) ?? [];
  for (const drive of drives.slice(0, MAX_DRIVES)) {
    await quietly(json(`/api/drives/${drive.id}/hauls?open=1`));
    await quietly(json(`/api/drives/${drive.id}/stock`));
  }
  const runs = (await quietly(json<RunJson[]>("/api/runs"))) ?? [];
  const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
  const upcoming = runs.filter((r) => r.assigneeId === person.id && r.state !== "done" && r.plannedOn >= yesterday).slice(0, MAX_RUNS);
  const places: Array<Array<{ lat: number; lng: number }>> = [];
  for (const run of upcoming) {
    await quietly(page(`/runs/${run.id}`));
    const detail = await quietly(json<RunDetailJson>(`/api/runs/${run.id}`));
    if (detail) places.push([detail.start, ...detail.stopList.map((s) => s.dropPoint)]);
  }
  // Only tiles from this site: another tile server's answers are opaque and of unknown size.
  if (!template.startsWith("/")) return;
  const name = tileCache(person);
  const urls = offlineTiles(places).map((t) => origin + tileUrl(template, t));
  await setWantedTiles(urls);
  const cache = await caches.open(name);
  for (const url of urls) {
    if (await cache.match(url)) continue;
    const res = await fetch(url).catch(() => null);
    if (!res?.ok) continue;
    if (!(await stillCurrent(person, gen))) throw new Superseded();
    await cache.put(url, res);
  }
  if (!(await stillCurrent(person, gen))) {
    await caches.delete(name);
    throw new Superseded();
  }
  // The budget counts every tile kept, the map's own and these.
  await trimTiles(name);
}
