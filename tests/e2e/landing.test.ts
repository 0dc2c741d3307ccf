import path from "node:path";
import { describe, expect, it } from "vitest";
import { newPage, PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { DEMO } from "@/tests/support/env";
import { testDb } from "@/tests/support/db";
import { addDrive, dayFromToday, freshGroup } from "@/tests/support/ledger";

const shots = path.resolve(import.meta.dirname, "../../.test-results");
const browser = browserForFile();

describe("landing page", () => {
  it("names Cantrove, lists public drives, and fits a phone without sideways scrolling", async () => {
    const { context, page } = await newPage(browser(), PHONE);
    const requests: string[] = [];
    page.on("request", (r) => requests.push(r.url()));
    await page.goto("/");
    await expect(page.title()).resolves.toContain("Cantrove");
    await expect(page.getByRole("link", { name: /Larkhollow Winter Warmth Drive/ }).count()).resolves.toBe(1);
    // A donor on a phone sees where to take cans before scrolling: the heading and the first running drive's link.
    const viewport = page.viewportSize()!;
    const find = await page.getByRole("heading", { name: "Find a drop point near you" }).boundingBox();
    // (Whichever running drive comes first: other tests' fixture groups run drives too.)
    const runningList = page.locator("section", { has: page.getByRole("heading", { name: "Collecting now" }) });
    const first = await runningList.locator('a[href^="/drives/"]').first().boundingBox();
    expect(find && first).toBeTruthy();
    expect(first!.y + first!.height).toBeLessThanOrEqual(viewport.height);
    // Touch targets at least 44 × 44 CSS px (WCAG 2.2 SC 2.5.5 Target Size, enhanced).
    for (const link of await page.locator('main a[href^="/drives/"]').all()) {
      expect((await link.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    }
    // Grouped by the group's own day: the demo's winter drive (1 Nov 2026 – 31 Jan 2027) runs on the
    // seeded day, the harvest drive (15 Aug – 15 Oct 2026) has ended.
    const running = runningList;
    await expect(running.getByRole("link", { name: /Larkhollow Winter Warmth Drive/ }).count()).resolves.toBe(1);
    await expect(running.getByRole("link", { name: /Larkhollow Harvest Fair Drive/ }).count()).resolves.toBe(0);
    // (Other tests' groups add ended drives, so the harvest drive may sit past the first five: the full list has it.)
    const endedAll = await newPage(browser(), PHONE);
    await endedAll.page.goto("/?all=ended");
    const ended = endedAll.page.locator("section", { has: endedAll.page.getByRole("heading", { name: "Ended", exact: true }) });
    await expect(ended.getByRole("link", { name: /Larkhollow Harvest Fair Drive/ }).count()).resolves.toBe(1);
    await endedAll.context.close();
    const fontFamily = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(fontFamily).toContain("Source Sans 3");
    const widths = await page.evaluate(() => [document.documentElement.scrollWidth, window.innerWidth]);
    expect(widths[0]).toBeLessThanOrEqual(widths[1]);
    await page.screenshot({ path: path.join(shots, "landing-phone.png"), fullPage: true });
    // First-load JavaScript as sent over the wire (next start compresses with gzip).
    const jsBytes = await page.evaluate(() =>
      performance
        .getEntriesByType("resource")
        .filter((e) => (e as PerformanceResourceTiming).initiatorType === "script" || e.name.endsWith(".js"))
        .reduce((sum, e) => sum + (e as PerformanceResourceTiming).encodedBodySize, 0),
    );
    console.log(`[measure] landing page first-load JS: ${(jsBytes / 1024).toFixed(1)} kB compressed`);
    expect(jsBytes).toBeGreaterThan(0);
    expect(jsBytes).toBeLessThan(250 * 1024);
    // Fonts and assets ship with the app: every request stays on loopback.
    expect(requests.filter((u) => !u.startsWith("http://127.0.0.1"))).toEqual([]);
    await context.close();
  });
});

describe("landing page lists", () => {
  it("shows five ended drives and a link to the rest, which lists them all", async () => {
    const g = await freshGroup("landing-cap");
    for (let i = 1; i <= 6; i++) {
      const id = await addDrive(g, { name: `Capped ended drive ${i} ${g.driveSlug}`, startsOn: dayFromToday(-60 - i), endsOn: dayFromToday(-30 - i), dropPoint: false });
      await testDb()("drives").where({ id }).update({ is_public: true });
    }
    const { context, page } = await newPage(browser(), PHONE);
    try {
      await page.goto("/");
      const ended = page.locator("section", { has: page.getByRole("heading", { name: "Ended", exact: true }) });
      await expect(ended.locator('a[href^="/drives/"]').count()).resolves.toBe(5);
      const more = ended.getByRole("link", { name: /^\d+ more drives?$/ });
      const hidden = Number((await more.innerText()).match(/\d+/)![0]);
      expect(hidden).toBeGreaterThanOrEqual(1);
      await more.click();
      await page.waitForURL((u) => u.searchParams.get("all") === "ended");
      await expect(ended.locator('a[href^="/drives/"]').count()).resolves.toBe(5 + hidden);
      await expect(ended.getByRole("link", { name: /more drives?$/ }).count()).resolves.toBe(0);
      for (let i = 1; i <= 6; i++) await expect(ended.getByRole("link", { name: new RegExp(`Capped ended drive ${i} `) }).count()).resolves.toBe(1);
    } finally {
      await context.close();
    }
  });
});

describe("signing in", () => {
  it("takes the organiser to the dashboard and shows captured mail on the sent-mail page", async () => {
    const { context, page } = await signedInPage(browser(), DEMO.organiser);
    expect(new URL(page.url()).pathname).toBe("/dashboard");
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Larkhollow Warm Rooms Circle");
    await page.getByRole("link", { name: "Sent mail" }).click();
    await page.waitForURL("**/mail");
    await expect(page.getByRole("heading", { name: "Sent mail" }).count()).resolves.toBe(1);
    await context.close();
  });

  it("says so when the password is wrong and stays on the form", async () => {
    const { context, page } = await newPage(browser());
    await page.goto("/signin");
    await page.getByLabel("E-mail").fill(DEMO.organiser);
    await page.getByLabel("Password").fill("wrong-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByText("do not match an account").waitFor();
    expect(new URL(page.url()).pathname).toBe("/signin");
    await context.close();
  });
});
