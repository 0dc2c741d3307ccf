import type { Page } from "playwright-core";

/** What the phone keeps, read in the page: its cache names and the paths in one person's cache. */
export async function kept(page: Page, cacheName: string) {
  return page.evaluate(async (name) => {
    const names = await caches.keys();
    const paths = names.includes(name) ? (await (await caches.open(name)).keys()).map((r) => new URL(r.url).pathname) : [];
    return { names, paths };
  }, cacheName);
}
