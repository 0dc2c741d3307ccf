import path from "node:path";
import type { Page } from "playwright-core";
import { PNG } from "pngjs";
import { describe, expect, it } from "vitest";
import { newPage, revealMaps, PHONE, signInAs, browserForFile } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { DEMO } from "@/tests/support/env";
import { createOwnGroup } from "@/tests/support/own-group";

// The nonce-based Content-Security-Policy (proxy.ts, lib/csp.ts) must let the
// app's own scripts, styles, fonts, tiles, queries and uploads through while
// allowing no inline script without the nonce. Directive names per CSP Level 3 (W3C).
const shots = path.resolve(import.meta.dirname, "../../.test-results");
const browser = browserForFile();

/** Records every violation the page reports, from its first script on. */
async function watchViolations(page: Page): Promise<string[]> {
  const seen: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy|Refused to (load|execute|apply|connect|evaluate)/i.test(m.text())) seen.push(`console: ${m.text()}`);
  });
  await page.exposeFunction("reportCspViolation", (text: string) => seen.push(`event: ${text}`));
  await page.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { reportCspViolation: (t: string) => void }).reportCspViolation(`${e.violatedDirective} blocked ${e.blockedURI || "inline"} at ${e.sourceFile}:${e.lineNumber}`);
    });
  });
  return seen;
}

function expectNoncePolicy(header: string | undefined) {
  const policy = header ?? "";
  const scripts = policy.split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src ")) ?? "";
  expect(scripts).toMatch(/'nonce-[A-Za-z0-9+/]{16,}={0,2}'/);
  expect(scripts).not.toContain("'unsafe-inline'");
  expect(policy).not.toContain(":*");
}

async function open(page: Page, url: string) {
  const res = await page.goto(url);
  expect(res?.status(), url).toBe(200);
  expectNoncePolicy(res?.headers()["content-security-policy"]);
  return res!;
}

describe("Content-Security-Policy in the browser", () => {
  it("gives each page load a fresh nonce, and the page's scripts carry it", async () => {
    const { context, page } = await newPage(browser());
    const first = (await open(page, "/")).headers()["content-security-policy"];
    const second = (await open(page, "/")).headers()["content-security-policy"];
    const nonceOf = (p: string) => /'nonce-([^']+)'/.exec(p)![1];
    expect(nonceOf(first)).not.toBe(nonceOf(second));
    const scripts = await page.$$eval("script", (els) => els.map((s) => ({ nonce: (s as HTMLScriptElement).nonce, src: (s as HTMLScriptElement).src })));
    expect(scripts.length).toBeGreaterThan(0);
    // Browsers hide the attribute once parsed but keep the value on the element.
    for (const s of scripts) expect(s.nonce, s.src || "inline script").toBe(nonceOf(second));
    await context.close();
  });

  it("blocks nothing on the landing page, a public drive's map, the planner and the signed-in dashboard", async () => {
    const { context, page } = await newPage(browser(), PHONE);
    const violations = await watchViolations(page);

    await open(page, "/");
    await page.getByRole("link", { name: "Larkhollow Winter Warmth Drive" }).waitFor();
    expect(await page.evaluate(() => getComputedStyle(document.body).fontFamily)).toContain("Source Sans 3");
    await page.evaluate(() => document.fonts.ready);
    await page.screenshot({ path: path.join(shots, "csp-landing.png"), fullPage: true });

    await open(page, "/drives/larkhollow-winter-2026");
    await revealMaps(page);
    await page.waitForSelector("img.leaflet-tile-loaded");
    await expect.poll(() => page.locator(".leaflet-marker-icon").count(), { timeout: 15_000 }).toBeGreaterThan(0);
    // The list is filled by react-query from the public JSON endpoints.
    await expect.poll(() => page.getByTestId("drop-point").count(), { timeout: 15_000 }).toBeGreaterThan(0);
    await page.locator(".leaflet-container").first().scrollIntoViewIfNeeded();
    await page.waitForFunction(() => document.querySelectorAll("img.leaflet-tile:not(.leaflet-tile-loaded)").length === 0);
    await page.screenshot({ path: path.join(shots, "csp-drive-map.png") });

    await open(page, "/plan");
    await page.getByRole("heading", { name: "Heater planner" }).waitFor();
    await page.screenshot({ path: path.join(shots, "csp-planner.png") });
    // The planner's figures are computed in the browser as the form changes.
    await page.getByLabel("Chamber and both manifolds").first().check();

    await signInAs(page, DEMO.organiser);
    await open(page, "/dashboard");
    await page.getByRole("heading", { level: 1 }).first().waitFor();
    await page.screenshot({ path: path.join(shots, "csp-dashboard.png"), fullPage: true });
    // A client-side navigation loads further chunks through the nonce'd runtime ('strict-dynamic').
    await page.getByRole("link", { name: /units/i }).first().click();
    await page.waitForURL(/\/units/);
    await page.getByRole("heading", { level: 1 }).first().waitFor();

    expect(violations).toEqual([]);
    await context.close();
  });

  it("lets an organiser upload a photo to the upload service and show it", async () => {
    const g = await createOwnGroup(testDb(), "csp-upload");
    const { context, page } = await newPage(browser());
    const violations = await watchViolations(page);
    await signInAs(page, g.emails.organiser);
    await open(page, `/organise/drop-points/${g.dropPointId}`);
    const png = new PNG({ width: 48, height: 48 });
    png.data.fill(150);
    await page.getByLabel("Add a photo of the bin").setInputFiles({ name: "bin.png", mimeType: "image/png", buffer: PNG.sync.write(png) });
    await page.getByText("Photo added.").waitFor({ timeout: 30_000 });
    const photo = page.getByRole("img", { name: /Photo of the bin at/ });
    await photo.waitFor();
    await expect.poll(() => photo.evaluate((img) => (img as HTMLImageElement).naturalWidth), { timeout: 10_000 }).toBe(48);
    expect(violations).toEqual([]);
    await context.close();
  });

  it("refuses a script injected into the page's HTML without the nonce", async () => {
    const { context, page } = await newPage(browser());
    const violations = await watchViolations(page);
    // What a stored cross-site script would be: markup in the server's answer, under the server's own policy.
    await page.route("**/", async (route) => {
      const res = await route.fetch();
      const html = (await res.text()).replace("</body>", "<script>window.__injected = true</script></body>");
      await route.fulfill({ response: res, body: html });
    });
    await open(page, "/");
    await page.getByRole("link", { name: "Larkhollow Winter Warmth Drive" }).waitFor();
    expect(await page.evaluate(() => (window as unknown as { __injected?: boolean }).__injected)).toBeUndefined();
    await expect.poll(() => violations.some((v) => v.includes("script-src"))).toBe(true);
    await context.close();
  });
});
