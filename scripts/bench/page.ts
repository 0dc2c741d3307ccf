import { chromium } from "playwright-core";

// Page weight and largest contentful paint of one page in Debian's headless
// chromium over loopback, cold cache, phone-sized viewport.
export interface PageResult {
  url: string;
  scripts: number;
  jsEncodedBytes: number;
  jsDecodedBytes: number;
  lcpMs: number | null;
  lcpElement: string | null;
  loadMs: number;
}

export async function measurePage(url: string): Promise<PageResult> {
  const browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
  });
  try {
    const runs: PageResult[] = [];
    // The first visit warms the server's own caches (compiled page, compressed assets); report the second, cold in the browser.
    for (let i = 0; i < 2; i++) {
      const context = await browser.newContext({ viewport: { width: 375, height: 740 }, isMobile: true, hasTouch: true });
      const page = await context.newPage();
      await page.addInitScript(() => {
        const w = window as unknown as { __lcp?: { t: number; el: string } };
        new PerformanceObserver((list) => {
          for (const e of list.getEntries() as (PerformanceEntry & { element?: Element | null })[]) {
            w.__lcp = { t: e.startTime, el: e.element ? e.element.tagName.toLowerCase() + (e.element.className ? "." + String(e.element.className).split(" ")[0] : "") : "" };
          }
        }).observe({ type: "largest-contentful-paint", buffered: true });
      });
      const started = Date.now();
      await page.goto(url, { waitUntil: "load" });
      const loadMs = Date.now() - started;
      await page.waitForLoadState("networkidle").catch(() => undefined);
      await page.waitForTimeout(500);
      // LCP stops updating at the first input; read it as the page settled.
      const r = await page.evaluate(() => {
        const res = performance.getEntriesByType("resource") as PerformanceResourceTiming[];
        const js = res.filter((e) => e.initiatorType === "script" || /\.js(\?|$)/.test(e.name));
        const w = window as unknown as { __lcp?: { t: number; el: string } };
        return {
          scripts: js.length,
          enc: js.reduce((s, e) => s + e.encodedBodySize, 0),
          dec: js.reduce((s, e) => s + e.decodedBodySize, 0),
          lcp: w.__lcp ?? null,
        };
      });
      runs.push({ url, scripts: r.scripts, jsEncodedBytes: r.enc, jsDecodedBytes: r.dec, lcpMs: r.lcp ? Math.round(r.lcp.t) : null, lcpElement: r.lcp?.el ?? null, loadMs });
      await context.close();
    }
    return runs[runs.length - 1];
  } finally {
    await browser.close();
  }
}
