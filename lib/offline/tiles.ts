// Which map tiles a phone keeps for a person's upcoming runs, within a budget.
// Pure: used by the service worker (app/sw.ts) and unit tested.

import { MIN_ZOOM, tileOf } from "@/lib/map/tiles";

/**
 * At most this many tiles per person (all their upcoming runs together). A
 * 256 px map tile is usually 5–25 kB (common practice, no published source;
 * the demo tiles average 3 kB), so the map part of the offline cache stays
 * under about 10 MB.
 */
export const OFFLINE_TILE_BUDGET = 400;
/** The route map opens fitted to the route; these are the zooms it lands on for a town-sized run. */
export const OFFLINE_ZOOMS = [MIN_ZOOM, 13, 14, 15] as const;
/** Around each stop, the closest zoom the map is used at. */
export const STOP_ZOOM = 16;

export interface TileRef {
  z: number;
  x: number;
  y: number;
}

/**
 * The tiles of each run's whole area at the overview zooms (with one tile of
 * margin), then a 3×3 block around every stop at STOP_ZOOM; the first
 * `budget` of them, overview first, so a long list still shows every route.
 */
export function offlineTiles(runs: Array<Array<{ lat: number; lng: number }>>, budget = OFFLINE_TILE_BUDGET): TileRef[] {
  const seen = new Set<string>();
  const out: TileRef[] = [];
  const add = (t: TileRef) => {
    const key = `${t.z}/${t.x}/${t.y}`;
    if (seen.has(key) || out.length >= budget) return;
    seen.add(key);
    out.push(t);
  };
  const places = runs.filter((r) => r.length > 0);
  for (const z of OFFLINE_ZOOMS) {
    for (const points of places) {
      const north = Math.max(...points.map((p) => p.lat));
      const south = Math.min(...points.map((p) => p.lat));
      const east = Math.max(...points.map((p) => p.lng));
      const west = Math.min(...points.map((p) => p.lng));
      const nw = tileOf(north, west, z);
      const se = tileOf(south, east, z);
      for (let x = nw.x - 1; x <= se.x + 1; x++) for (let y = nw.y - 1; y <= se.y + 1; y++) add({ z, x, y });
    }
  }
  for (const points of places) {
    for (const p of points) {
      const c = tileOf(p.lat, p.lng, STOP_ZOOM);
      for (let dx = -1; dx <= 1; dx++) for (let dy = -1; dy <= 1; dy++) add({ z: STOP_ZOOM, x: c.x + dx, y: c.y + dy });
    }
  }
  return out;
}

/** A tile's address from the map's URL template ("/tiles/{z}/{x}/{y}.png"). */
export function tileUrl(template: string, t: TileRef): string {
  return template.replace("{z}", String(t.z)).replace("{x}", String(t.x)).replace("{y}", String(t.y)).replace("{s}", "a");
}

/**
 * Which kept tiles go so that at most `budget` stay: the tiles the last warm-up chose for the
 * person's runs stay first, then the most recently kept of the others (the map the person looked
 * at). `kept` is in the order the tiles were kept, oldest first (the Cache API's order).
 */
export function tilesOverBudget(kept: string[], wanted: ReadonlySet<string>, budget = OFFLINE_TILE_BUDGET): string[] {
  if (kept.length <= budget) return [];
  const stay = new Set<string>();
  for (const url of kept) if (wanted.has(url) && stay.size < budget) stay.add(url);
  for (let i = kept.length - 1; i >= 0 && stay.size < budget; i--) stay.add(kept[i]);
  return kept.filter((url) => !stay.has(url));
}
