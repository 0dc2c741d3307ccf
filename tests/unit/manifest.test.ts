// The manifest's installability requirements as Lighthouse 12 checks them
// ("installable-manifest", from memory of its audit): name or short_name,
// start_url, display standalone/fullscreen/minimal-ui, a PNG icon of at least
// 192 px and one of at least 512 px; a maskable icon for the "maskable-icon" audit.
// The icon files are read and their real size checked (PNG IHDR, per the PNG spec, W3C).
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { PNG } from "pngjs";
import manifest from "@/app/manifest";

const m = manifest();

describe("web app manifest", () => {
  it("has what an installable app needs", () => {
    expect(m.name || m.short_name).toBeTruthy();
    expect(m.start_url).toBe("/home");
    expect(["standalone", "fullscreen", "minimal-ui"]).toContain(m.display);
    expect(m.theme_color).toMatch(/^#[0-9a-f]{6}$/i);
    expect(m.background_color).toMatch(/^#[0-9a-f]{6}$/i);
  });

  it("lists PNG icons of 192 and 512 px and a maskable one, and the files are those sizes", () => {
    const icons = m.icons ?? [];
    for (const want of [192, 512]) expect(icons.some((i) => i.sizes === `${want}x${want}` && i.type === "image/png")).toBe(true);
    expect(icons.some((i) => String(i.purpose).includes("maskable"))).toBe(true);
    for (const icon of icons) {
      const png = PNG.sync.read(readFileSync(`public${icon.src}`));
      expect(`${png.width}x${png.height}`).toBe(icon.sizes);
    }
  });

  it("gives the maskable icon an opaque edge (no see-through corners when a launcher crops it)", () => {
    const png = PNG.sync.read(readFileSync("public/icons/icon-maskable-512.png"));
    const alphaAt = (x: number, y: number) => png.data[(y * png.width + x) * 4 + 3];
    expect([alphaAt(0, 0), alphaAt(511, 0), alphaAt(0, 511), alphaAt(511, 511)]).toEqual([255, 255, 255, 255]);
  });
});
