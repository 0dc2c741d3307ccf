import { chromium } from "playwright-core";
const b = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--headless", "--no-sandbox", "--disable-gpu"] });
const ctx = await b.newContext({ viewport: { width: 375, height: 740 }, isMobile: true, hasTouch: true, baseURL: "http://127.0.0.1:4002" });
const page = await ctx.newPage();
page.on("pageerror", (e) => console.log("pageerror:", e.message.slice(0, 300)));
await page.goto("/signin");
await page.getByLabel("E-mail").fill("organiser@cantrove.test");
await page.getByLabel("Password").fill("cantrove-demo");
await page.getByRole("button", { name: "Sign in" }).click();
await page.waitForURL((u) => !u.pathname.startsWith("/signin"));
await page.goto("/organise/drives");
await page.getByRole("link", { name: "Larkhollow Winter Warmth Drive" }).click();
await page.waitForURL(/organise\/drives\/[0-9a-f-]{36}/);
await page.getByRole("link", { name: "Larkhollow Library porch", exact: true }).click();
await page.waitForURL(/drop-points/);
await page.waitForSelector(".leaflet-tile-loaded", { timeout: 30000 });
await page.waitForTimeout(800);
await page.screenshot({ path: "/tmp/org-point.png", fullPage: true });
// keyboard on the public page
const p2 = await (await b.newContext({ viewport: { width: 375, height: 740 }, baseURL: "http://127.0.0.1:4002" })).newPage();
await p2.goto("/drives/larkhollow-winter-2026");
await p2.waitForSelector(".leaflet-marker-icon");
const seen: string[] = [];
for (let i = 0; i < 14; i++) { await p2.keyboard.press("Tab"); seen.push(await p2.evaluate(() => { const e = document.activeElement as HTMLElement; return `${e.tagName}:${(e.getAttribute("aria-label") ?? e.getAttribute("title") ?? e.textContent ?? "").slice(0, 40)}`; })); }
console.log(seen.join("\n"));
await p2.keyboard.press("Enter");
await p2.waitForTimeout(500);
await p2.screenshot({ path: "/tmp/kb.png" });
await b.close();
