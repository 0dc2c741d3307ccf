import type { Route } from "playwright-core";
import { describe, expect, it } from "vitest";
import { newPage, revealMaps, PHONE, browserForFile } from "@/tests/support/browser";
import { waitForMail } from "@/tests/support/mail";

// The public drive page is what a passer-by opens from a sign on a bin, often
// on a phone: its first load is held to a JavaScript budget, and its forms
// work before that JavaScript has arrived.
const PAGE = "/drives/larkhollow-winter-2026";
// The page-weight budget set for the public drive page: 200 kB of compressed
// JavaScript (1 kB = 1000 bytes), the map's Leaflet code included.
const BUDGET_BYTES = 200_000;

const browser = browserForFile();

describe("public drive page weight", () => {
  it("loads at most 200 kB of compressed JavaScript on a phone, map and pledge form included", async () => {
    const { context, page } = await newPage(browser(), PHONE);
    try {
      await page.goto(PAGE);
      // The map's code counts too (it loads once the map is scrolled near): wait for the pins it draws.
      await revealMaps(page);
      await page.locator(".leaflet-marker-icon").first().waitFor();
      await page.waitForLoadState("networkidle");
      const js = await page.evaluate(() =>
        (performance.getEntriesByType("resource") as PerformanceResourceTiming[])
          .filter((e) => e.initiatorType === "script" || /\.js(\?|$)/.test(e.name))
          .reduce((sum, e) => sum + e.encodedBodySize, 0),
      );
      console.log(`[measure] public drive page first-load JS: ${(js / 1000).toFixed(1)} kB compressed`);
      expect(js).toBeGreaterThan(40_000); // Leaflet alone is about this much: the sum is real.
      expect(js).toBeLessThanOrEqual(BUDGET_BYTES);
      // The pledge form is part of that load: a plain form posting to a server action, rendered by the server.
      await expect(page.getByRole("form", { name: "Pledge cans" }).getAttribute("method")).resolves.toMatch(/post/i);
    } finally {
      await context.close();
    }
  });

  it("sends a pledge typed before the page's code arrived, as a plain form post, and answers with the confirmation", async () => {
    const { context, page } = await newPage(browser(), PHONE);
    try {
      // A slow connection: no script of the app ever arrives.
      const held: Route[] = [];
      await page.route((url) => url.pathname.startsWith("/_next/static/chunks/") && url.pathname.endsWith(".js"), (route) => void held.push(route));
      await page.goto(PAGE, { waitUntil: "commit" });
      const donor = `early-${Date.now().toString(36)}@example.test`;
      const point = page.getByLabel("Drop point", { exact: true });
      await point.selectOption({ index: 2 });
      const pointName = (await point.locator("option:checked").textContent())!;
      await page.getByLabel("About how many bags").fill("4");
      await page.getByLabel("When you will bring them").fill("2026-12-10");
      await page.getByLabel("E-mail for a confirmation (optional)").fill(donor);
      const sent = page.waitForRequest((r) => r.method() === "POST" && new URL(r.url()).pathname === PAGE);
      await page.getByRole("button", { name: "Send my pledge" }).click();
      expect((await sent).postData()).toContain(donor);
      await page.getByText("Thank you — your pledge is in.").waitFor();
      await page.getByText(`We sent a confirmation to ${donor}.`).waitFor();
      // The answers went in the body, never in the address.
      expect(page.url()).not.toContain(encodeURIComponent(donor));
      expect(held.length).toBeGreaterThan(0);
      expect((await waitForMail(donor)).text).toContain(pointName);
    } finally {
      await context.close();
    }
  });
});
