import { AxeBuilder } from "@axe-core/playwright";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "@/tests/support/browser";
import { screensByRole, type Screen } from "./pages/screens";
import { RoleSessions } from "./pages/visit";

// axe-core (Deque's rules for WCAG 2.0–2.2 A and AA and best practice) over
// every screen as each role that uses it, on a phone-sized screen; a serious
// or critical violation fails the page.
let browser: Browser;
let sessions: RoleSessions;
let screens: Screen[];
beforeAll(async () => {
  browser = await launchBrowser();
  sessions = new RoleSessions(browser, { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  screens = await screensByRole();
});
afterAll(async () => {
  await sessions?.close();
  await browser?.close();
});

describe("axe-core on every screen", () => {
  it("finds no serious or critical violation on any page, for any role", { timeout: 240_000 }, async () => {
    const found: string[] = [];
    for (const screen of screens) {
      const page = await sessions.open(screen);
      const { violations, passes } = await new AxeBuilder({ page }).analyze();
      expect(passes.length, `${screen.path}: axe ran its rules`).toBeGreaterThan(10);
      for (const v of violations.filter((v) => v.impact === "serious" || v.impact === "critical")) {
        found.push(`${screen.path} (${screen.role}) ${v.impact} ${v.id}: ${v.help} — ${v.nodes.slice(0, 3).map((n) => n.target.join(" ")).join(", ")}`);
      }
      console.log(`[axe] ${screen.path} (${screen.role}): ${violations.length} violations, ${violations.map((v) => `${v.id}/${v.impact}`).join(", ")}`);
    }
    expect(found).toEqual([]);
  });
});
