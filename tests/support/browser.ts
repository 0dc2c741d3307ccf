import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
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

export const PHONE = { viewport: { width: 375, height: 740 }, isMobile: true, hasTouch: true };

export async function newPage(browser: Browser, options: Parameters<Browser["newContext"]>[0] = {}): Promise<{ context: BrowserContext; page: Page }> {
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
