import { describe, expect, it } from "vitest";
import { newPage, revealMaps, PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { DEMO } from "@/tests/support/env";
import { screensByRole } from "./pages/screens";
import { RoleSessions } from "./pages/visit";
import { smallTargets } from "./pages/targets";

// WCAG 2.2, success criterion 2.5.5 "Target Size (Enhanced)": targets of at
// least 44 by 44 CSS pixels. Checked on the signed-in header's links on a phone,
// and the dashboard's drive dates read as words, not ISO codes.
const browser = browserForFile();

describe("the signed-in header on a phone", () => {
  it("gives every navigation link a target at least 44 px tall, and dates in words", async () => {
    const { context, page } = await signedInPage(browser(), DEMO.organiser, PHONE);
    await page.goto("/dashboard");
    const links = page.getByRole("navigation", { name: "Group" }).getByRole("link");
    const count = await links.count();
    expect(count).toBeGreaterThanOrEqual(6);
    for (let i = 0; i < count; i++) {
      const box = await links.nth(i).boundingBox();
      expect(box?.height, await links.nth(i).innerText()).toBeGreaterThanOrEqual(44);
    }
    const main = await page.locator("main").innerText();
    expect(main).toMatch(/\d{1,2} [A-Z][a-z]{2} \d{4} – \d{1,2} [A-Z][a-z]{2} \d{4}/);
    expect(main).not.toMatch(/\d{4}-\d{2}-\d{2} to \d{4}-\d{2}-\d{2}/);
    await context.close();
  });

  it("gives the public map's zoom buttons targets of at least 44 × 44 px", async () => {
    const { context, page } = await newPage(browser(), PHONE);
    await page.goto("/drives/larkhollow-winter-2026");
    await revealMaps(page);
    const zoomIn = page.getByRole("button", { name: "Zoom in" });
    await zoomIn.waitFor();
    for (const name of ["Zoom in", "Zoom out"]) {
      const box = await page.getByRole("button", { name }).boundingBox();
      expect(box?.width, name).toBeGreaterThanOrEqual(44);
      expect(box?.height, name).toBeGreaterThanOrEqual(44);
    }
    await context.close();
  });
});

// Every clickable thing on every screen, for each role that uses it, on a
// 390 px wide phone. WCAG 2.5.5's "Inline" exception is taken: a link inside a
// sentence or block of running text is exempt (see pages/targets.ts).
describe("every screen's targets on a 390 px phone", () => {
  it("has no clickable element smaller than 44 × 44 px, and no screen wider than the phone", { timeout: 240_000 }, async () => {
    const sessions = new RoleSessions(browser(), { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const found: string[] = [];
    const wide: string[] = [];
    try {
      for (const screen of await screensByRole()) {
        const page = await sessions.open(screen);
        // Maps load when scrolled near; their pins and controls are measured too.
        if (await page.locator("[data-map-slot]").count()) {
          await revealMaps(page);
          await page.evaluate(() => window.scrollTo(0, 0));
        }
        const { measured, small } = await smallTargets(page);
        expect(measured, `${screen.path}: targets were found and measured`).toBeGreaterThan(3);
        console.log(`[touch] ${screen.path} (${screen.role}): ${measured} targets, ${small.length} too small`);
        for (const t of small) found.push(`${screen.path} (${screen.role}) ${t}`);
        // Nothing pushes the page sideways either (an escaped absolutely placed label once made /ledger 770 px wide).
        const width = await page.evaluate(() => document.documentElement.scrollWidth);
        if (width > 390) wide.push(`${screen.path} (${screen.role}) is ${width} px wide`);
        // Our own one-word labels stay whole (a narrow column once showed "Und/o" and "Lin/e").
        const broken = await page.evaluate(() =>
          [...document.querySelectorAll("button, th, summary")].flatMap((el) => {
            const text = (el.textContent ?? "").trim();
            if (!/^\p{L}+$/u.test(text) || el.getClientRects().length === 0) return [];
            const range = document.createRange();
            range.selectNodeContents(el);
            const tops = new Set([...range.getClientRects()].filter((r) => r.width > 0).map((r) => Math.round(r.top)));
            return tops.size > 1 ? [text] : [];
          }),
        );
        for (const word of broken) wide.push(`${screen.path} (${screen.role}): "${word}" breaks mid-word`);
      }
    } finally {
      await sessions.close();
    }
    expect(found).toEqual([]);
    expect(wide).toEqual([]);
  });
});
