import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { newPage, PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { freshGroup } from "@/tests/support/ledger";
import { SCHEMAS_MISSING } from "@/hooks/use-lazy-schemas";

// Signed-in forms and the planner fetch their zod schemas after the page is
// drawn (hooks/use-lazy-schemas.ts). Here the connection "drops" right after the
// first load: every script the page did not ask for in its HTML is refused.
// The bundler keeps a chunk that failed as failed, so recovery is a reload.
const browser = browserForFile();

/** Refuses every app script not named in the page's HTML (what loads on demand); returns a switch to let them through again. */
async function dropOnDemandScripts(page: Page, path: string): Promise<() => Promise<void>> {
  const html = await (await page.request.get(path)).text();
  const firstLoad = new Set([...html.matchAll(/\/_next\/static\/chunks\/[^"'\s]+\.js/g)].map((m) => m[0]));
  expect(firstLoad.size).toBeGreaterThan(3);
  const refused: string[] = [];
  const handler = (route: import("playwright-core").Route) => {
    const url = new URL(route.request().url());
    if (firstLoad.has(url.pathname)) return route.continue();
    refused.push(url.pathname);
    return route.abort("internetdisconnected");
  };
  const scripts = (url: URL) => url.pathname.startsWith("/_next/static/chunks/") && url.pathname.endsWith(".js");
  await page.route(scripts, handler);
  return async () => {
    expect(refused.length, "some script was loaded on demand and refused").toBeGreaterThan(0);
    await page.unroute(scripts, handler);
  };
}

describe("forms' checks load at first use", () => {
  it("the Log page does not fetch its checks while it loads, and fetches them at the first focus", async () => {
    const g = await freshGroup("e2e-first-use");
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, { ...PHONE, serviceWorkers: "block" });
    try {
      // The haul schema's own message marks the chunk of the ledger's checks (lib/ledger/schemas.ts).
      const fetched: string[] = [];
      page.on("response", async (r) => {
        if (!new URL(r.url()).pathname.startsWith("/_next/static/chunks/")) return;
        if ((await r.text().catch(() => "")).includes("Enter the bags, the weight, or both.")) fetched.push(r.url());
      });
      await page.goto(`/log?dropPoint=${g.dropPointIds[0]}`, { waitUntil: "networkidle" });
      await page.getByRole("button", { name: "Record haul" }).waitFor();
      await page.waitForTimeout(1_500);
      expect(fetched, "checks fetched while the page loaded").toEqual([]);
      await page.getByLabel("Bags", { exact: true }).focus();
      await expect.poll(() => fetched.length, { timeout: 15_000 }).toBe(1);
      // And they check: a bag count of 0 with no weight is refused with the schema's message.
      await page.getByLabel("Bags", { exact: true }).fill("0");
      await page.getByRole("button", { name: "Record haul" }).click();
      await page.getByText("Enter the bags, the weight, or both.").first().waitFor({ timeout: 15_000 });
    } finally {
      await context.close();
    }
  });
});

describe("forms whose checks could not load", () => {
  it("the planner draws its opening sheets without its schemas, says so when an edit cannot be checked, and checks edits after a reload online", async () => {
    const { context, page } = await newPage(browser(), PHONE);
    try {
      const restore = await dropOnDemandScripts(page, "/plan");
      await page.goto("/plan");
      // The opening sheet's grid (30 × 60 in over the chamber: 11 × 12 = 132 cans, common practice, no published source) needs no zod.
      await expect.poll(() => page.locator('[data-figure="cans"]').first().innerText(), { timeout: 15_000 }).toBe("132");
      await page.locator("#sheet-1-width").fill("31");
      await page.getByRole("alert").filter({ hasText: "The planner could not load its checks" }).first().waitFor();
      // Nothing computed from the unchecked value: no grid figures for the edited sheet.
      await expect(page.locator('[data-figure="columns"]').count()).resolves.toBe(0);
      await restore();
      await page.reload();
      await page.locator("#sheet-1-width").fill("-3");
      await page.getByText("Glazing width must be greater than 0").first().waitFor({ timeout: 15_000 });
      await page.locator("#sheet-1-width").fill("31");
      await expect.poll(() => page.locator('[data-figure="columns"]').first().innerText(), { timeout: 15_000 }).toMatch(/^\d+$/);
      await expect(page.getByText("The planner could not load its checks").count()).resolves.toBe(0);
    } finally {
      await context.close();
    }
  });

  it("a volunteer's haul sent before the checks arrived is not sent and says why; after a reload online it is recorded", async () => {
    const g = await freshGroup("e2e-lazy");
    // Without the offline worker (a first visit, before it has taken over): once it has, it has
    // precached every chunk and the checks load with no signal at all (tests/e2e/offline.test.ts).
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, { ...PHONE, serviceWorkers: "block" });
    try {
      const path = `/log?dropPoint=${g.dropPointIds[0]}`;
      const restore = await dropOnDemandScripts(page, path);
      await page.goto(path);
      const posts: string[] = [];
      page.on("request", (r) => {
        if (r.method() === "POST" && r.url().includes("/hauls")) posts.push(r.url());
      });
      await page.getByRole("tab", { name: "Log a haul" }).click();
      await page.getByLabel("Bags", { exact: true }).fill("2");
      await page.getByRole("button", { name: "Record haul" }).click();
      await page.getByText(SCHEMAS_MISSING).waitFor();
      expect(posts).toEqual([]);
      expect(await page.getByLabel("Bags", { exact: true }).inputValue()).toBe("2");
      await restore();
      await page.reload();
      await page.getByRole("tab", { name: "Log a haul" }).click();
      await page.getByLabel("Bags", { exact: true }).fill("2");
      await page.getByRole("button", { name: "Record haul" }).click();
      await page.getByText(/Haul recorded/).waitFor({ timeout: 15_000 });
      await expect(page.getByText(SCHEMAS_MISSING).count()).resolves.toBe(0);
      expect(posts.length).toBe(1);
    } finally {
      await context.close();
    }
  });
});
