/**
 * Renders the demo map tiles public/tiles/{z}/{x}/{y}.png from the project's
 * own invented map data (db/map/larkhollow.geojson, CC0). Run: npm run tiles.
 * Each tile is drawn in global pixel space and clipped, so shapes and labels
 * that cross a tile edge line up with their neighbours.
 */
import { mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { createCanvas, type SKRSContext2D } from "@napi-rs/canvas";
import { DEMO_DROP_POINTS } from "../db/seeds/data/scenario";
import { MAX_ZOOM, TILE_SIZE, demoTiles, project } from "../lib/map/tiles";

type Pos = [number, number];
interface Feature {
  properties: { kind: string; name?: string };
  geometry: { type: "Polygon"; coordinates: Pos[][] } | { type: "LineString"; coordinates: Pos[] } | { type: "Point"; coordinates: Pos };
}

export const COLOURS = {
  sea: "#a9cbd6",
  land: "#f1ead9",
  town: "#e8dcc6",
  park: "#c9dfb8",
  wood: "#b5d1a2",
  sand: "#ece0b4",
  water: "#a9cbd6",
  river: "#8fb8c8",
  roadCase: "#c2b59d",
  main: "#fffaf0",
  street: "#ffffff",
  path: "#d8ccb4",
  label: "#3b342c",
  waterLabel: "#2f5a6b",
};

const root = path.resolve(import.meta.dirname, "..");
const features = (JSON.parse(readFileSync(path.join(root, "db/map/larkhollow.geojson"), "utf8")) as { features: Feature[] }).features;

function roadWidth(kind: string, z: number): number {
  const base = kind === "main" ? 2.2 : kind === "street" ? 1.4 : 0.8;
  return Math.max(0.8, base * 2 ** (z - 14));
}

function tracePolygon(ctx: SKRSContext2D, rings: Pos[][], z: number) {
  ctx.beginPath();
  for (const ring of rings) {
    ring.forEach(([lng, lat], i) => {
      const [px, py] = project(lng, lat, z);
      if (i === 0) ctx.moveTo(px, py);
      else ctx.lineTo(px, py);
    });
    ctx.closePath();
  }
}

function traceLine(ctx: SKRSContext2D, coords: Pos[], z: number) {
  ctx.beginPath();
  coords.forEach(([lng, lat], i) => {
    const [px, py] = project(lng, lat, z);
    if (i === 0) ctx.moveTo(px, py);
    else ctx.lineTo(px, py);
  });
}

function fillKind(ctx: SKRSContext2D, kind: string, colour: string, z: number) {
  ctx.fillStyle = colour;
  for (const f of features) {
    if (f.properties.kind === kind && f.geometry.type === "Polygon") {
      tracePolygon(ctx, f.geometry.coordinates, z);
      ctx.fill("evenodd");
    }
  }
}

function strokeLines(ctx: SKRSContext2D, kinds: string[], colour: string, width: (kind: string) => number) {
  ctx.strokeStyle = colour;
  ctx.lineCap = "round";
  ctx.lineJoin = "round";
  for (const f of features) {
    if (kinds.includes(f.properties.kind) && f.geometry.type === "LineString") {
      ctx.lineWidth = width(f.properties.kind);
      traceLine(ctx, f.geometry.coordinates, currentZ);
      ctx.stroke();
    }
  }
}

/** Longest segment of a line: the street name sits along it, read left to right. */
function labelAnchor(coords: Pos[], z: number): { x: number; y: number; angle: number; length: number } {
  let best = { x: 0, y: 0, angle: 0, length: -1 };
  for (let i = 1; i < coords.length; i++) {
    const [ax, ay] = project(coords[i - 1][0], coords[i - 1][1], z);
    const [bx, by] = project(coords[i][0], coords[i][1], z);
    const length = Math.hypot(bx - ax, by - ay);
    if (length > best.length) {
      let angle = Math.atan2(by - ay, bx - ax);
      if (angle > Math.PI / 2) angle -= Math.PI;
      if (angle < -Math.PI / 2) angle += Math.PI;
      best = { x: (ax + bx) / 2, y: (ay + by) / 2, angle, length };
    }
  }
  return best;
}

function haloText(ctx: SKRSContext2D, text: string, x: number, y: number, colour: string) {
  ctx.lineWidth = 3;
  ctx.strokeStyle = "rgba(255,255,255,0.85)";
  ctx.strokeText(text, x, y);
  ctx.fillStyle = colour;
  ctx.fillText(text, x, y);
}

function drawLabels(ctx: SKRSContext2D, z: number) {
  ctx.textAlign = "center";
  ctx.textBaseline = "middle";
  for (const f of features) {
    const { kind, name } = f.properties;
    if (!name) continue;
    if (f.geometry.type === "LineString" && (kind === "main" || kind === "street" || kind === "river") && z >= 15) {
      const a = labelAnchor(f.geometry.coordinates, z);
      ctx.font = `${kind === "river" ? "italic " : ""}${z >= 16 ? 12 : 10}px "Liberation Sans"`;
      if (ctx.measureText(name).width > a.length * 0.9) continue;
      ctx.save();
      ctx.translate(a.x, a.y);
      ctx.rotate(a.angle);
      haloText(ctx, name, 0, 0, kind === "river" ? COLOURS.waterLabel : COLOURS.label);
      ctx.restore();
    } else if (f.geometry.type === "Point") {
      const [x, y] = project(f.geometry.coordinates[0], f.geometry.coordinates[1], z);
      if (kind === "place" && z <= 15) {
        ctx.font = `bold ${z <= 13 ? 12 : 15}px "Liberation Sans"`;
        haloText(ctx, name, x, y, COLOURS.label);
      } else if (kind === "water-label" && z >= 13 && z <= 16) {
        ctx.font = `italic ${z <= 14 ? 11 : 13}px "Liberation Sans"`;
        haloText(ctx, name, x, y, COLOURS.waterLabel);
      }
    } else if (f.geometry.type === "Polygon" && (kind === "park" || kind === "wood") && z >= 16) {
      const ring = f.geometry.coordinates[0];
      const cx = ring.reduce((s, p) => s + p[0], 0) / ring.length;
      const cy = ring.reduce((s, p) => s + p[1], 0) / ring.length;
      const [x, y] = project(cx, cy, z);
      ctx.font = `italic 11px "Liberation Sans"`;
      haloText(ctx, name, x, y, "#2f5a2f");
    }
  }
}

let currentZ = 0;

export function renderTile(z: number, x: number, y: number): Buffer {
  currentZ = z;
  const canvas = createCanvas(TILE_SIZE, TILE_SIZE);
  const ctx = canvas.getContext("2d");
  ctx.fillStyle = COLOURS.sea;
  ctx.fillRect(0, 0, TILE_SIZE, TILE_SIZE);
  ctx.translate(-x * TILE_SIZE, -y * TILE_SIZE);
  fillKind(ctx, "land", COLOURS.land, z);
  fillKind(ctx, "town", COLOURS.town, z);
  fillKind(ctx, "sand", COLOURS.sand, z);
  fillKind(ctx, "wood", COLOURS.wood, z);
  fillKind(ctx, "park", COLOURS.park, z);
  fillKind(ctx, "water", COLOURS.water, z);
  strokeLines(ctx, ["river"], COLOURS.river, () => Math.max(1.5, 1.2 * 2 ** (z - 13)));
  strokeLines(ctx, ["pier"], COLOURS.roadCase, () => Math.max(1, 0.8 * 2 ** (z - 14)));
  strokeLines(ctx, ["main", "street"], COLOURS.roadCase, (k) => roadWidth(k, z) + (z >= 14 ? 1.5 : 0.6));
  strokeLines(ctx, ["path"], COLOURS.path, (k) => roadWidth(k, z));
  strokeLines(ctx, ["main", "street"], COLOURS.main, (k) => roadWidth(k, z));
  drawLabels(ctx, z);
  return canvas.toBuffer("image/png");
}

function main() {
  const outDir = path.join(root, "public/tiles");
  rmSync(outDir, { recursive: true, force: true });
  const tiles = demoTiles(DEMO_DROP_POINTS.map((p) => ({ lat: p.lat, lng: p.lng })));
  let bytes = 0;
  for (const t of tiles) {
    const dir = path.join(outDir, String(t.z), String(t.x));
    mkdirSync(dir, { recursive: true });
    const png = renderTile(t.z, t.x, t.y);
    bytes += png.length;
    writeFileSync(path.join(dir, `${t.y}.png`), png);
  }
  // Leaflet shows this where no tile exists (outside the demo area): open sea.
  const sea = createCanvas(TILE_SIZE, TILE_SIZE);
  const sctx = sea.getContext("2d");
  sctx.fillStyle = COLOURS.sea;
  sctx.fillRect(0, 0, TILE_SIZE, TILE_SIZE);
  writeFileSync(path.join(outDir, "sea.png"), sea.toBuffer("image/png"));
  console.log(`Wrote ${tiles.length} tiles (${(bytes / 1e6).toFixed(1)} MB) up to zoom ${MAX_ZOOM} in public/tiles`);
}

main();
