import { describe, expect, it } from "vitest";
import { OFFLINE_TILE_BUDGET, OFFLINE_ZOOMS, STOP_ZOOM, offlineTiles, tileUrl, tilesOverBudget } from "@/lib/offline/tiles";

// Tile numbers by the OpenStreetMap wiki's "Slippy map tilenames" formula
// (https://wiki.openstreetmap.org/wiki/Slippy_map_tilenames), computed here
// independently of lib/map/tiles.ts.
function osmTile(lat: number, lng: number, z: number) {
  const n = 2 ** z;
  const x = Math.floor(((lng + 180) / 360) * n);
  const r = (lat * Math.PI) / 180;
  const y = Math.floor(((1 - Math.asinh(Math.tan(r)) / Math.PI) / 2) * n);
  return { x, y };
}

const stops = [
  { lat: 47.2, lng: -8.0 },
  { lat: 47.205, lng: -7.99 },
  { lat: 47.231, lng: -7.952 },
];

describe("offline map tiles", () => {
  it("holds every stop's own tile at every overview zoom and at the stop zoom", () => {
    const tiles = offlineTiles([stops]);
    const has = (z: number, t: { x: number; y: number }) => tiles.some((u) => u.z === z && u.x === t.x && u.y === t.y);
    for (const p of stops) {
      for (const z of [...OFFLINE_ZOOMS, STOP_ZOOM]) expect(has(z, osmTile(p.lat, p.lng, z))).toBe(true);
    }
  });

  it("never lists a tile twice and stays within the budget, overview zooms first", () => {
    const many = Array.from({ length: 40 }, (_, i) => [{ lat: 47 + i * 0.01, lng: -8 + i * 0.02 }, { lat: 47.5 + i * 0.01, lng: -7.5 }]);
    const tiles = offlineTiles(many);
    expect(tiles.length).toBe(OFFLINE_TILE_BUDGET);
    expect(new Set(tiles.map((t) => `${t.z}/${t.x}/${t.y}`)).size).toBe(tiles.length);
    expect(tiles[0]!.z).toBe(OFFLINE_ZOOMS[0]);
    expect(offlineTiles([stops], 5)).toHaveLength(5);
    expect(offlineTiles([])).toEqual([]);
  });

  it("fills the map's URL template", () => {
    expect(tileUrl("/tiles/{z}/{x}/{y}.png", { z: 16, x: 31305, y: 22851 })).toBe("/tiles/16/31305/22851.png");
  });
});

describe("the tile budget over everything kept", () => {
  const urls = (prefix: string, n: number) => Array.from({ length: n }, (_, i) => `/tiles/${prefix}/${i}.png`);

  it("drops nothing within the budget", () => {
    expect(tilesOverBudget(urls("a", 10), new Set(), 10)).toEqual([]);
  });

  it("keeps the run's chosen tiles first, then the newest others, and never more than the budget", () => {
    const browsed = urls("map", 8); // kept first, by looking at the map
    const chosen = urls("run", 5); // kept by the warm-up, after
    const kept = [...browsed, ...chosen];
    const drop = tilesOverBudget(kept, new Set(chosen), 7);
    expect(kept.length - drop.length).toBe(7);
    const stay = kept.filter((u) => !drop.includes(u));
    expect(stay).toEqual(expect.arrayContaining(chosen));
    // The two newest browsed tiles stay beside them; the six oldest go.
    expect(stay.filter((u) => u.includes("/map/"))).toEqual([browsed[6], browsed[7]]);
  });

  it("keeps only part of the chosen tiles when they alone pass the budget", () => {
    const chosen = urls("run", 6);
    expect(tilesOverBudget(chosen, new Set(chosen), 4)).toEqual(chosen.slice(4));
  });
});
