import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import { PNG } from "pngjs";
import { describe, expect, it } from "vitest";
import { DEMO_DROP_POINTS } from "@/db/seeds/data/scenario";
import { latToTileY, lngToTileX, MAX_ZOOM, MIN_ZOOM, tileOf } from "@/lib/map/tiles";

const root = path.resolve(import.meta.dirname, "../../..");

// Reference: OpenStreetMap wiki, "Slippy map tilenames", which gives
//   n = 2^zoom, xtile = n × (lon + 180) / 360,
//   ytile = n × (1 − asinh(tan(lat_rad)) / π) / 2
// (the asinh form; lib/map/tiles.ts uses the equivalent ln(tan + sec) form).
function wikiTile(lat: number, lng: number, z: number) {
  const n = 2 ** z;
  const rad = (lat * Math.PI) / 180;
  return { x: Math.floor((n * (lng + 180)) / 360), y: Math.floor((n * (1 - Math.asinh(Math.tan(rad)) / Math.PI)) / 2) };
}

describe("Web Mercator tile numbers", () => {
  it("puts the equator and prime meridian on the centre of the grid", () => {
    for (let z = 1; z <= 18; z++) {
      expect(lngToTileX(0, z)).toBeCloseTo(2 ** (z - 1), 9);
      expect(latToTileY(0, z)).toBeCloseTo(2 ** (z - 1), 9);
    }
  });

  it("reaches the edges of the grid at ±180° and the Web Mercator limit ±85.0511°", () => {
    // The projection's latitude limit, atan(sinh(π)) ≈ 85.0511°, is where y runs 0 … 2^z.
    const limit = (Math.atan(Math.sinh(Math.PI)) * 180) / Math.PI;
    expect(lngToTileX(-180, 12)).toBe(0);
    expect(lngToTileX(180, 12)).toBe(4096);
    expect(latToTileY(limit, 12)).toBeCloseTo(0, 6);
    expect(latToTileY(-limit, 12)).toBeCloseTo(4096, 6);
  });

  it("agrees with the wiki's asinh formula at every zoom for every demo drop point", () => {
    for (const p of DEMO_DROP_POINTS) {
      for (let z = 0; z <= 19; z++) expect(tileOf(p.lat, p.lng, z)).toEqual(wikiTile(p.lat, p.lng, z));
    }
  });
});

describe("committed demo tiles", () => {
  it("cover every demo drop point at zooms 12 to 17 with a 256 px PNG", () => {
    const missing: string[] = [];
    for (const p of DEMO_DROP_POINTS) {
      for (let z = MIN_ZOOM; z <= MAX_ZOOM; z++) {
        const { x, y } = wikiTile(p.lat, p.lng, z);
        const file = path.join(root, "public/tiles", String(z), String(x), `${y}.png`);
        if (!existsSync(file)) {
          missing.push(`${p.name} z${z} ${x}/${y}`);
          continue;
        }
        const png = PNG.sync.read(readFileSync(file));
        expect([png.width, png.height]).toEqual([256, 256]);
      }
    }
    expect(missing).toEqual([]);
  });

  it("draws land, not open sea, under each drop point at zoom 17", () => {
    // Sea is the one flat colour of tiles/sea.png; a drop point must sit on the island.
    const sea = PNG.sync.read(readFileSync(path.join(root, "public/tiles/sea.png")));
    const seaRgb = [...sea.data.subarray(0, 3)];
    for (const p of DEMO_DROP_POINTS) {
      const fx = lngToTileX(p.lng, 17);
      const fy = latToTileY(p.lat, 17);
      const file = path.join(root, "public/tiles/17", String(Math.floor(fx)), `${Math.floor(fy)}.png`);
      const png = PNG.sync.read(readFileSync(file));
      const px = Math.floor((fx % 1) * 256);
      const py = Math.floor((fy % 1) * 256);
      const i = (py * 256 + px) * 4;
      expect([...png.data.subarray(i, i + 3)], p.name).not.toEqual(seaRgb);
    }
  });
});
