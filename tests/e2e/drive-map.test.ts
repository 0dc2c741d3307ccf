import { describe, expect, it } from "vitest";
import { newPage, revealMaps, PHONE, browserForFile } from "@/tests/support/browser";
import { DEMO_DROP_POINTS } from "@/db/seeds/data/scenario";

const browser = browserForFile();

describe("public drive map", () => {
  it("shows the committed tiles and one marker per active drop point, on a phone", async () => {
    const { context, page } = await newPage(browser(), PHONE);
    const tileResponses: number[] = [];
    page.on("response", (r) => {
      if (r.url().includes("/tiles/")) tileResponses.push(r.status());
    });
    await page.goto("/drives/larkhollow-winter-2026");
    await revealMaps(page);
    await page.waitForSelector("img.leaflet-tile-loaded");
    await page.waitForFunction(() => document.querySelectorAll("img.leaflet-tile:not(.leaflet-tile-loaded)").length === 0);
    const tiles = await page.$$eval("img.leaflet-tile-loaded", (imgs) =>
      imgs.map((i) => ({ src: (i as HTMLImageElement).src, w: (i as HTMLImageElement).naturalWidth })),
    );
    expect(tiles.length).toBeGreaterThan(0);
    for (const t of tiles) {
      expect(t.src).toMatch(/\/tiles\/1[2-7]\/\d+\/\d+\.png$/);
      expect(t.w).toBe(256);
    }
    expect(tileResponses.every((s) => s === 200 || s === 304)).toBe(true);
    const winter = DEMO_DROP_POINTS.filter((p) => p.drive === "winter");
    await expect.poll(() => page.locator(".leaflet-marker-icon").count(), { timeout: 15_000 }).toBe(winter.length);
    const titles = await page.locator(".leaflet-marker-icon").evaluateAll((els) => els.map((e) => e.getAttribute("title")));
    expect(titles.sort()).toEqual(winter.map((p) => p.name).sort());
    await expect.poll(() => page.getByTestId("drop-point").count(), { timeout: 15_000 }).toBe(winter.length);
    // Nothing wider than the phone's screen.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    await page.getByText("Map: Larkhollow demo town data").first().waitFor();
    await context.close();
  });

  it("sorts the list by distance when the visitor shares a location", async () => {
    // Standing at the harbour: the Quayside hall is nearest (haversine, lib/runs/great-circle.ts).
    const { context, page } = await newPage(browser(), { ...PHONE, geolocation: { latitude: 47.1930, longitude: -7.9970 }, permissions: ["geolocation"] });
    await page.goto("/drives/larkhollow-winter-2026");
    await page.getByRole("button", { name: "Sort by distance from me" }).click();
    await page.getByRole("heading", { name: "Drop points nearest first" }).waitFor();
    const first = await page.getByTestId("drop-point").first().textContent();
    expect(first).toContain("Quayside Community Hall");
    // A no-break space joins the number and its unit (\s matches U+00A0).
    expect(first).toMatch(/\d+\sm away/);
    await context.close();
  });
});
