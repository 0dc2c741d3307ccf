import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { afterAll, beforeAll } from "vitest";
import { closeTestDb } from "./db";
import { APP_URL, DEMO_PASSWORD } from "./env";

// Debian's chromium, never a downloaded browser; background networking off so
// nothing leaves loopback.
export const CHROMIUM_FLAGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
];

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: "/usr/bin/chromium", args: CHROMIUM_FLAGS });
}

/**
 * One browser for the whole test file: registers a beforeAll that launches it
 * and an afterAll that closes it and the test database's pool (a no-op when the
 * file never opened it). Returns a getter, for use inside tests and later hooks.
 */
export function browserForFile(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await closeTestDb();
  });
  return () => {
    if (!browser) throw new Error("browserForFile(): the browser is not launched yet; use the getter inside a test or a hook registered after browserForFile()");
    return browser;
  };
}

type ContextOptions = Parameters<Browser["newContext"]>[0];

export const PHONE = { viewport: { width: 375, height: 740 }, isMobile: true, hasTouch: true };

export async function newPage(browser: Browser, options: ContextOptions = {}): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ baseURL: APP_URL, ...options });
  const page = await context.newPage();
  return { context, page };
}

/** Page object for /signin. */
export async function signInAs(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/signin"), { timeout: 15_000 });
}

/** A new context and page, already signed in as `email` (a demo or fresh-group account). */
export async function signedInPage(browser: Browser, email: string, options: ContextOptions = {}, password = DEMO_PASSWORD): Promise<{ context: BrowserContext; page: Page }> {
  const opened = await newPage(browser, options);
  await signInAs(opened.page, email, password);
  return opened;
}

/**
 * Scrolls each map on the page into view, so it loads (maps load when a person scrolls
 * near them: components/map/drive-map.tsx), and waits until every one is drawn.
 */
export async function revealMaps(page: Page): Promise<void> {
  await page.waitForFunction(
    () => {
      const slot = document.querySelector("[data-map-slot]");
      slot?.scrollIntoView({ block: "center" });
      return !slot && document.querySelector(".leaflet-container") !== null;
    },
    undefined,
    { timeout: 15_000, polling: 200 },
  );
}
