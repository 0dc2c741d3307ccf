// Draws the home-screen icons (public/icons) from the mark in app/icon.svg:
// 192 and 512 px, and a maskable 512 px whose mark sits inside the central
// 80 % "safe zone" of the W3C Web App Manifest's maskable icons.
// Run: node --import tsx scripts/make-icons.ts (the PNGs are committed).
import { readFileSync, writeFileSync } from "node:fs";
import { createCanvas, loadImage } from "@napi-rs/canvas";

const svg = readFileSync("app/icon.svg");

async function draw(size: number, maskable: boolean): Promise<Buffer> {
  const canvas = createCanvas(size, size);
  const ctx = canvas.getContext("2d");
  const image = await loadImage(svg);
  if (maskable) {
    ctx.fillStyle = "#1f1b16"; // the mark's own background, to the edges
    ctx.fillRect(0, 0, size, size);
    const inner = Math.round(size * 0.7);
    const at = Math.round((size - inner) / 2);
    ctx.drawImage(image, at, at, inner, inner);
  } else {
    ctx.drawImage(image, 0, 0, size, size);
  }
  return canvas.toBuffer("image/png");
}

writeFileSync("public/icons/icon-192.png", await draw(192, false));
writeFileSync("public/icons/icon-512.png", await draw(512, false));
writeFileSync("public/icons/icon-maskable-512.png", await draw(512, true));
