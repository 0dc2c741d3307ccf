/**
 * Web Mercator ("slippy map") tile numbers and the area the committed demo
 * tiles cover. Pure: used by the tile script, the map component and tests.
 */

export const TILE_SIZE = 256;
export const MIN_ZOOM = 12;
export const MAX_ZOOM = 17;

export interface BBox {
  south: number;
  west: number;
  north: number;
  east: number;
}

/** Larkhollow island and its sea margin: every demo drop point lies inside. */
export const DEMO_TILE_BBOX: BBox = { south: 47.183, west: -8.036, north: 47.241, east: -7.94 };

/** At the closest zoom only the town centre and small squares around drop points are drawn. */
export const DEMO_Z17_BBOXES: BBox[] = [
  { south: 47.1885, west: -8.0165, north: 47.2115, east: -7.9885 },
  { south: 47.2275, west: -7.9575, north: 47.2345, east: -7.9485 },
];

/** Fractional tile x for a longitude at zoom z. */
export function lngToTileX(lng: number, z: number): number {
  return ((lng + 180) / 360) * 2 ** z;
}

/** Fractional tile y for a latitude at zoom z (Web Mercator). */
export function latToTileY(lat: number, z: number): number {
  const rad = (lat * Math.PI) / 180;
  return ((1 - Math.log(Math.tan(rad) + 1 / Math.cos(rad)) / Math.PI) / 2) * 2 ** z;
}

export function tileOf(lat: number, lng: number, z: number): { x: number; y: number } {
  return { x: Math.floor(lngToTileX(lng, z)), y: Math.floor(latToTileY(lat, z)) };
}

/** Global pixel position at zoom z (tile numbers × 256). */
export function project(lng: number, lat: number, z: number): [number, number] {
  return [lngToTileX(lng, z) * TILE_SIZE, latToTileY(lat, z) * TILE_SIZE];
}

export function tilesInBBox(b: BBox, z: number): Array<{ x: number; y: number }> {
  const nw = tileOf(b.north, b.west, z);
  const se = tileOf(b.south, b.east, z);
  const out: Array<{ x: number; y: number }> = [];
  for (let x = nw.x; x <= se.x; x++) for (let y = nw.y; y <= se.y; y++) out.push({ x, y });
  return out;
}

/** Every tile the demo set holds, one entry per z/x/y. */
export function demoTiles(extraPoints: Array<{ lat: number; lng: number }> = []): Array<{ z: number; x: number; y: number }> {
  const seen = new Set<string>();
  const out: Array<{ z: number; x: number; y: number }> = [];
  const add = (z: number, x: number, y: number) => {
    const key = `${z}/${x}/${y}`;
    if (seen.has(key)) return;
    seen.add(key);
    out.push({ z, x, y });
  };
  for (let z = MIN_ZOOM; z < MAX_ZOOM; z++) for (const t of tilesInBBox(DEMO_TILE_BBOX, z)) add(z, t.x, t.y);
  for (const b of DEMO_Z17_BBOXES) for (const t of tilesInBBox(b, MAX_ZOOM)) add(MAX_ZOOM, t.x, t.y);
  for (const p of extraPoints) {
    const c = tileOf(p.lat, p.lng, MAX_ZOOM);
    for (let dx = -1; dx <= 1; dx++) for (let dy = -1; dy <= 1; dy++) add(MAX_ZOOM, c.x + dx, c.y + dy);
  }
  return out;
}
