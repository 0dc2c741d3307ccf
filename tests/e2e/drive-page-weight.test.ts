import type { Browser, Route } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, newPage, PHONE } from "@/tests/support/browser";
import { waitForMail } from "@/tests/support/mail";

// The public drive page is what a passer-by opens from a sign on a bin, often
// on a phone: its first load is held to a JavaScript budget, and the parts
// below the map arrive only when wanted without changing what a visitor sees.
const PAGE = "/drives/larkhollow-winter-2026";
// The page-weight budget set for the public drive page: 200 kB of compressed
// JavaScript (1 kB = 1000 bytes), the map's Leaflet code included.
const BUDGET_BYTES = 200_000;

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("public drive page weight", () => {
  it("loads at most 200 kB of compressed JavaScript on a phone, map included, and no pledge form code until it is wanted", async () => {
    const { context, page } = await newPage(browser, PHONE);
    try {
      await page.goto(PAGE);
      // The map's code is part of the first load: wait for the pins it draws.
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
      // The form is in the page (server-rendered) but its code has not run yet.
      const form = page.getByRole("form", { name: "Pledge cans" });
      await expect(form.getAttribute("data-live")).resolves.toBeNull();
      await form.scrollIntoViewIfNeeded();
      await expect.poll(() => form.getAttribute("data-live"), { timeout: 15_000 }).toBe("true");
    } finally {
      await context.close();
    }
  });

  it("keeps a pledge typed and sent before the form's code arrived, and sends it once the code is there", async () => {
    const { context, page } = await newPage(browser, PHONE);
    try {
      await page.goto(PAGE);
      await page.locator(".leaflet-marker-icon").first().waitFor();
      await page.waitForLoadState("networkidle");
      // From here on, hold back every script the page asks for (a slow connection).
      const held: Route[] = [];
      let holding = true;
      await page.route("**/_next/static/chunks/**", (route) => (holding ? held.push(route) : route.continue()));
      const donor = `early-${Date.now().toString(36)}@example.test`;
      const point = page.getByLabel("Drop point", { exact: true });
      await point.selectOption({ index: 2 });
      const pointName = (await point.locator("option:checked").textContent())!;
      await page.getByLabel("About how many bags").fill("4");
      await page.getByLabel("When you will bring them").fill("2026-12-10");
      await page.getByLabel("E-mail for a confirmation (optional)").fill(donor);
      const before = page.url();
      await page.getByRole("button", { name: "Send my pledge" }).click();
      await expect.poll(() => held.length).toBeGreaterThan(0);
      // No page reload with the answers in the address; the send waits.
      expect(page.url()).toBe(before);
      await expect(page.getByRole("form", { name: "Pledge cans" }).getAttribute("data-submit-waiting")).resolves.toBe("true");

      const sent = page.waitForRequest((r) => r.url().endsWith("/pledges") && r.method() === "POST");
      holding = false;
      for (const route of held) await route.continue();
      expect(JSON.parse((await sent).postData() ?? "{}")).toMatchObject({ bags: 4, bringOn: "2026-12-10", email: donor });
      await page.getByText("Thank you — your pledge is in.").waitFor();
      await page.getByText(`We sent a confirmation to ${donor}.`).waitFor();
      expect((await waitForMail(donor)).text).toContain(pointName);
    } finally {
      await context.close();
    }
  });
});
