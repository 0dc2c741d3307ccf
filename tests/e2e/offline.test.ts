import { mkdtempSync, rmSync } from "node:fs";
import http from "node:http";
import type { AddressInfo } from "node:net";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { kept } from "@/tests/support/offline-caches";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { CHROMIUM_FLAGS, PHONE, browserForFile, newPage, signInAs } from "@/tests/support/browser";
import { APP_URL } from "@/tests/support/env";
import { testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";

// No signal (issue 17): after one online visit the service worker (app/sw.ts)
// has kept the volunteer's pages, run and map tiles, and entries made offline
// wait in IndexedDB until the connection returns. The connection is cut with
// context.setOffline(true) BEFORE each offline navigation, so every page and
// answer below comes from this phone, not the server.
const browser = browserForFile();
const SHOTS = ".test-results";

const ACCESS = "Bin behind the blue gate; code 4471, ask at the counter after 16:00.";
const HOST_PHONE = "+99 555 0142";

async function setUp(): Promise<{ g: FreshGroup; runId: string; volId: string; volKey: string }> {
  const g = await freshGroup("offline");
  const db = testDb();
  await db("drop_points").where({ id: g.dropPointIds[0] }).update({ address: "4 Quay Lane, Larkhollow", hours: "Mon–Sat 8:00–18:00", access_notes: ACCESS, host_name: "Ida Fenwick", host_phone: HOST_PHONE });
  await db("drop_points").where({ id: g.dropPointIds[1] }).update({ address: "Millbrook Road 12", hours: "School days 7:30–16:00", access_notes: "Side entrance by the bike shed.", host_name: "Rory Teague", host_phone: "+99 555 0199" });
  const vol = await g.client("volunteer");
  const volId = (await vol.json<{ user: { id: string } }>("GET", "/api/me")).body.user.id;
  const org = await g.client("organiser");
  const plannedOn = new Date(Date.now() + 2 * 86_400_000).toISOString().slice(0, 10);
  const run = await org.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn, start: { lat: 47.199, lng: -8.001 }, dropPointIds: g.dropPointIds, assigneeId: volId });
  if (run.status !== 201) throw new Error(`run not created: ${run.status} ${JSON.stringify(run.body)}`);
  // What the phone keeps is filed under the person in their group (lib/offline/store.ts).
  return { g, runId: run.body.id, volId, volKey: `${volId}.${g.groupId}` };
}


/** The online visit: signed in, the worker installed and in control, and the person's run and tiles kept. */
async function visitOnline(context: BrowserContext, email: string, personKey: string, runId: string): Promise<Page> {
  const page = await context.newPage();
  await signInAs(page, email);
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 30_000 });
  await expect
    .poll(async () => (await kept(page, `cantrove-person-${personKey}`)).paths, { timeout: 30_000 })
    .toEqual(expect.arrayContaining(["/log", "/runs", `/runs/${runId}`, `/api/runs/${runId}`]));
  await expect.poll(async () => (await kept(page, `cantrove-tiles-${personKey}`)).paths.length, { timeout: 30_000 }).toBeGreaterThan(20);
  return page;
}

const renderedAt = (page: Page) => page.locator("[data-cantrove-person]").getAttribute("data-rendered-at");

describe("offline from a cold start", () => {
  it("opens /log and the volunteer's run with every stop's details and map tiles, with no connection", async () => {
    const { g, runId, volKey } = await setUp();
    const { context } = await newPage(browser(), PHONE);
    const online = await visitOnline(context, g.emails.volunteer, volKey, runId);
    const tiles = (await kept(online, `cantrove-tiles-${volKey}`)).paths;
    const keptAt = await online.evaluate(async (key) => {
      const res = await (await caches.open(key)).match(new URL("/log", location.origin).href);
      return /data-rendered-at="([^"]+)"/.exec((await res?.text()) ?? "")?.[1] ?? null;
    }, `cantrove-person-${volKey}`);
    expect(keptAt).not.toBeNull();
    // Every page closed: the next open is a cold start.
    for (const p of context.pages()) await p.close();

    await context.setOffline(true);
    const page = await context.newPage();
    await page.goto("/log");
    await page.getByRole("heading", { name: /Hello, Test/ }).waitFor();
    // The page is the kept copy, not a fresh one: its time is the kept time.
    expect(await renderedAt(page)).toBe(keptAt);
    await page.getByTestId("offline-notice").waitFor();
    expect(await page.getByTestId("offline-notice").innerText()).toMatch(/^Offline — last updated \d{1,2}:\d{2}/);
    // What the page read online (the drive's stock) is there too.
    await page.locator('[data-stage="hauled"]').waitFor();
    expect(await page.getByText(/Could not load the stock/).count()).toBe(0);
    // The drive's drop points are there to choose from.
    const options = await page.getByLabel("Drop point").locator("option").allInnerTexts();
    expect(options.join("|")).toContain("North porch");
    await page.screenshot({ path: `${SHOTS}/offline-log-phone.png`, fullPage: true });

    await page.goto(`/runs/${runId}`);
    const stop = page.getByRole("listitem", { name: /^Stop \d+: North porch$/ });
    await stop.waitFor();
    const text = await stop.innerText();
    expect(text).toContain("4 Quay Lane, Larkhollow");
    expect(text).toContain("Mon–Sat 8:00–18:00");
    expect(text).toContain(ACCESS);
    expect(text).toContain("Ida Fenwick");
    expect(await stop.getByRole("link", { name: HOST_PHONE }).getAttribute("href")).toBe("tel:+995550142");
    // The map draws from the kept tiles.
    await expect.poll(() => page.locator(".leaflet-tile-loaded").count(), { timeout: 15_000 }).toBeGreaterThan(0);
    const shown = await page.locator(".leaflet-tile-loaded").evaluateAll((imgs) => imgs.map((i) => new URL((i as HTMLImageElement).src).pathname));
    expect(shown.every((p) => tiles.includes(p))).toBe(true);
    // A page never opened online says so plainly.
    await page.goto("/members");
    await page.getByRole("heading", { name: "No connection" }).waitFor();
    await context.close();
  });
});

describe("entries made with no connection", () => {
  it("records a haul, a sort, a stop's haul and a stop's skip exactly once, at the time they were entered, after the page was closed and the signal came back", async () => {
    const { g, runId, volKey } = await setUp();
    // Stock to sort: one haul already in, made online.
    const vol = await g.client("volunteer");
    const first = await vol.json<{ id: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[1], bags: 1 });
    expect(first.status).toBe(201);
    const { context } = await newPage(browser(), PHONE);
    const online = await visitOnline(context, g.emails.volunteer, volKey, runId);
    // The sort tab was never opened online: the worker's warm-up kept what it reads (the hauls to sort).
    await expect.poll(async () => (await kept(online, `cantrove-person-${volKey}`)).paths, { timeout: 30_000 }).toContain(`/api/drives/${g.driveId}/hauls`);
    for (const p of context.pages()) await p.close();

    await context.setOffline(true);
    const enteredFrom = new Date();
    const page = await context.newPage();
    await page.goto("/log");
    await page.getByTestId("offline-notice").waitFor();
    await page.getByRole("tab", { name: "Log a haul" }).click();
    await page.getByLabel("Drop point").selectOption(g.dropPointIds[0]);
    await page.getByLabel("Bags", { exact: true }).fill("4");
    await page.getByRole("button", { name: "Record haul" }).click();
    await page.getByText(/saved on this phone/i).first().waitFor();
    await page.getByRole("tab", { name: "Log a sort" }).click();
    await page.getByRole("checkbox").first().check();
    await page.getByLabel("Good cans", { exact: true }).fill("40");
    await page.getByRole("button", { name: "Record sort" }).click();
    await expect.poll(() => page.getByTestId("waiting-entry").count()).toBe(2);
    await page.screenshot({ path: `${SHOTS}/offline-waiting-phone.png`, fullPage: true });

    await page.goto(`/runs/${runId}`);
    const stop = page.getByRole("listitem", { name: /^Stop \d+: South gate$/ });
    await stop.getByRole("button", { name: "Log the haul here" }).click();
    await stop.getByLabel("Bags", { exact: true }).fill("2");
    await stop.getByRole("button", { name: "Save the haul" }).click();
    await stop.getByTestId("waiting-entry").waitFor();
    expect(await stop.getByTestId("waiting-entry").innerText()).toMatch(/Waiting to be sent: Haul at South gate: 2 bags/);
    // The other stop is skipped, offline too: it keeps the time it was entered, like the hauls.
    const north = page.getByRole("listitem", { name: /^Stop \d+: North porch$/ });
    await north.getByRole("button", { name: "Skip with a reason" }).click();
    await north.getByLabel("Why skip this stop?").fill("Gate locked, nobody there");
    await north.getByRole("button", { name: "Skip this stop" }).click();
    await north.getByTestId("waiting-entry").waitFor();
    await page.screenshot({ path: `${SHOTS}/offline-run-waiting-phone.png`, fullPage: true });
    const enteredTo = new Date();
    // Closed with three entries waiting.
    await page.close();
    const db = testDb();
    expect(await db("hauls").where({ drive_id: g.driveId }).count<{ n: string }[]>({ n: "*" })).toEqual([{ n: "1" }]);

    await new Promise((r) => setTimeout(r, 1500));
    const backAt = new Date();
    await context.setOffline(false);
    const again = await context.newPage();
    await again.goto("/log");
    await expect.poll(async () => Number((await db("movements").where({ drive_id: g.driveId }).count<{ n: string }[]>({ n: "*" }))[0]!.n), { timeout: 30_000 }).toBe(4);
    await again.getByTestId("outbox").waitFor({ state: "detached", timeout: 20_000 });
    // Once each: two hauls made offline (4 bags on the Log page, 2 at the stop), one sort.
    const moves = await db("movements").where({ drive_id: g.driveId }).orderBy("occurred_at").select("kind", "occurred_at", "recorded_at");
    expect(moves.map((m) => m.kind).sort()).toEqual(["haul", "haul", "haul", "sort"]);
    const offline = moves.filter((m) => new Date(m.recorded_at) >= backAt);
    expect(offline).toHaveLength(3);
    for (const m of offline) {
      // At the time of entry (while offline), not the time it reached the server.
      expect(new Date(m.occurred_at).getTime()).toBeGreaterThanOrEqual(enteredFrom.getTime() - 1000);
      expect(new Date(m.occurred_at).getTime()).toBeLessThanOrEqual(enteredTo.getTime());
    }
    const stopRow = await db("pickup_run_stops").where({ run_id: runId, drop_point_id: g.dropPointIds[1] }).first();
    expect(stopRow.status).toBe("logged");
    const skipped = await db("pickup_run_stops").where({ run_id: runId, drop_point_id: g.dropPointIds[0] }).first();
    expect(skipped.status).toBe("skipped");
    expect(skipped.skip_reason).toBe("Gate locked, nobody there");
    // Stamped when entered (offline), not when it reached the server after the signal came back.
    expect(new Date(skipped.resolved_at).getTime()).toBeGreaterThanOrEqual(enteredFrom.getTime() - 1000);
    expect(new Date(skipped.resolved_at).getTime()).toBeLessThanOrEqual(enteredTo.getTime());
    const bags = await db("hauls").where({ drive_id: g.driveId }).orderBy("bags").pluck("bags");
    expect(bags).toEqual([1, 2, 4]);
    await context.close();
  });
});

describe("Background Sync with no page of the app open", () => {
  it("sends an entry queued offline once the signal is back, without the app being opened again", async () => {
    // Chromium decides by itself when to fire a waiting sync, and watches the machine's real
    // network, not context.setOffline's emulation, so a test cannot make it fire on "signal back".
    // The nearest honest thing: DevTools' own "fire this sync" (ServiceWorker.dispatchSyncEvent),
    // sent through a blank tab, while no page of the app is open; the worker alone sends the entry.
    const { g, runId, volKey } = await setUp();
    const { context } = await newPage(browser(), PHONE);
    await visitOnline(context, g.emails.volunteer, volKey, runId);
    for (const p of context.pages()) await p.close();

    await context.setOffline(true);
    const page = await context.newPage();
    await page.goto("/log");
    await page.getByTestId("offline-notice").waitFor();
    const enteredFrom = new Date();
    await page.getByLabel("Drop point").selectOption(g.dropPointIds[0]);
    await page.getByLabel("Bags", { exact: true }).fill("3");
    await page.getByRole("button", { name: "Record haul" }).click();
    await page.getByText(/saved on this phone/i).first().waitFor();
    const enteredTo = new Date();
    // The page asked the browser for the sync.
    await expect
      .poll(() => page.evaluate(async () => ((await navigator.serviceWorker.ready) as ServiceWorkerRegistration & { sync: { getTags(): Promise<string[]> } }).sync.getTags()))
      .toContain("cantrove-outbox");
    await page.close();
    const db = testDb();
    const hauls = async () => Number((await db("hauls").where({ drive_id: g.driveId }).count<{ n: string }[]>({ n: "*" }))[0]!.n);
    expect(await hauls()).toBe(0);

    await context.setOffline(false);
    const blank = await context.newPage();
    expect(blank.url()).toBe("about:blank");
    const cdp = await context.newCDPSession(blank);
    const origin = new URL(APP_URL).origin;
    const registration = new Promise<string>((resolve) => {
      cdp.on("ServiceWorker.workerRegistrationUpdated", (e: { registrations: Array<{ registrationId: string; scopeURL: string; isDeleted: boolean }> }) => {
        const r = e.registrations.find((x) => x.scopeURL === `${origin}/` && !x.isDeleted);
        if (r) resolve(r.registrationId);
      });
    });
    await cdp.send("ServiceWorker.enable");
    const registrationId = await registration;
    await cdp.send("ServiceWorker.dispatchSyncEvent", { origin, registrationId, tag: "cantrove-outbox", lastChance: false });
    await expect.poll(hauls, { timeout: 20_000 }).toBe(1);
    // No page of the app was opened for it.
    expect(context.pages().map((p) => p.url())).toEqual(["about:blank"]);
    const move = await db("movements").where({ drive_id: g.driveId, kind: "haul" }).first();
    expect(new Date(move.occurred_at).getTime()).toBeGreaterThanOrEqual(enteredFrom.getTime() - 1000);
    expect(new Date(move.occurred_at).getTime()).toBeLessThanOrEqual(enteredTo.getTime());
    expect(await db("hauls").where({ drive_id: g.driveId }).pluck("bags")).toEqual([3]);
    await context.close();
  });
});

describe("a shared phone", () => {
  it("after sign-out and someone else signing in, shows none of the first person's data with no connection", async () => {
    const { g, runId, volId, volKey } = await setUp();
    const { context } = await newPage(browser(), PHONE);
    const online = await visitOnline(context, g.emails.volunteer, volKey, runId);
    await online.getByRole("button", { name: "Sign out" }).click();
    await online.waitForURL(/\/signin/);
    const after = await kept(online, "");
    expect(after.names.filter((n) => n.includes(volId))).toEqual([]);

    const other = await context.newPage();
    await signInAs(other, g.emails.volunteer2);
    const otherId = await other.locator("[data-cantrove-person]").getAttribute("data-cantrove-person");
    expect(otherId).not.toBe(volId);
    await other.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 30_000 });
    await expect.poll(async () => (await kept(other, `cantrove-person-${otherId}.${g.groupId}`)).paths, { timeout: 30_000 }).toContain("/log");
    for (const p of context.pages()) await p.close();

    await context.setOffline(true);
    const page = await context.newPage();
    await page.goto(`/runs/${runId}`);
    await page.getByRole("heading", { name: "No connection" }).waitFor();
    expect(await page.content()).not.toContain(ACCESS);
    await page.goto("/log");
    await page.getByTestId("offline-notice").waitFor();
    expect(await page.locator("[data-cantrove-person]").getAttribute("data-cantrove-person")).toBe(otherId);
    expect(await page.getByTestId("waiting-entry").count()).toBe(0);
    const names = (await kept(page, "")).names;
    expect(names.some((n) => n.includes(volId))).toBe(false);
    const queued = await page.evaluate(
      () =>
        new Promise<number>((resolve) => {
          const open = indexedDB.open("cantrove-offline");
          open.onsuccess = () => {
            const req = open.result.transaction("outbox").objectStore("outbox").count();
            req.onsuccess = () => resolve(req.result);
          };
        }),
    );
    expect(queued).toBe(0);
    await context.close();
  });
});

describe("a new version", () => {
  it("deployed while the app is open, offers \"New version — reload\" and reloads into it", async () => {
    // A deploy is simulated by a small proxy in front of the app that, once switched, answers
    // /serwist/sw.js with the served file plus one line, as the server does after any deploy that
    // changes the app. (The browser's worker-script update fetch cannot be intercepted by
    // Playwright's route or Chromium's Fetch domain, and Next keeps the built file in memory.)
    const { g } = await setUp();
    const app = new URL(APP_URL);
    let deployed = 0;
    let servedNew = 0;
    const proxy = http.createServer((req, res) => {
      const headers = { ...req.headers };
      if (req.url?.startsWith("/serwist/sw.js")) delete headers["accept-encoding"]; // a plain body, to add a line to
      const up = http.request({ host: app.hostname, port: app.port, path: req.url, method: req.method, headers }, (answer) => {
        if (deployed > 0 && req.url?.startsWith("/serwist/sw.js") && answer.statusCode === 200) {
          const parts: Buffer[] = [];
          answer.on("data", (c: Buffer) => parts.push(c));
          answer.on("end", () => {
            servedNew += 1;
            const body = Buffer.concat([...parts, Buffer.from(`\n// deploy ${deployed}\n`)]);
            res.writeHead(200, { ...answer.headers, "content-length": String(body.length) });
            res.end(body);
          });
          return;
        }
        res.writeHead(answer.statusCode ?? 502, answer.headers);
        answer.pipe(res);
      });
      up.on("error", () => res.destroy());
      req.pipe(up);
    });
    await new Promise<void>((resolve) => proxy.listen(0, "127.0.0.1", resolve));
    const origin = `http://127.0.0.1:${(proxy.address() as AddressInfo).port}`;
    const { context, page } = await newPage(browser(), { ...PHONE, baseURL: origin });
    try {
      // Signed in through the API (cookies are per host, not per port), then the app opened through the proxy.
      const vol = await g.client("volunteer");
      await context.addCookies(vol.cookie().split("; ").map((pair) => {
        const eq = pair.indexOf("=");
        return { name: pair.slice(0, eq), value: pair.slice(eq + 1), domain: "127.0.0.1", path: "/" };
      }));
      await page.goto("/log");
      await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 30_000 });
      expect(await page.getByTestId("update-prompt").count()).toBe(0);
      deployed = 1;
      // The browser's own update check (made on every visit and every 30 minutes by the app), made now.
      await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())!.update());
      const prompt = page.getByTestId("update-prompt");
      await prompt.waitFor({ timeout: 30_000 });
      expect(servedNew).toBeGreaterThan(0);
      expect(await prompt.innerText()).toMatch(/New version of Cantrove — reload/);
      await page.screenshot({ path: `${SHOTS}/update-prompt-phone.png` });
      const reloaded = page.waitForEvent("load");
      await prompt.getByRole("button", { name: "Reload" }).click();
      await reloaded;
      await page.getByRole("heading", { name: /Hello/ }).waitFor();
      expect(await page.getByTestId("update-prompt").count()).toBe(0);
      expect(await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())!.waiting === null)).toBe(true);
    } finally {
      await context.close();
      await new Promise((resolve) => proxy.close(resolve));
    }
  });
});

describe("installable", () => {
  it("passes Chromium's installability check (manifest, icons, start URL, a worker in control) once signed in", async () => {
    // Chromium's own check, the one Lighthouse's "installable-manifest" audit read before
    // Lighthouse 12 dropped its PWA category. It needs a normal profile (a Playwright
    // context counts as incognito, which is never installable), hence a persistent one.
    const { g } = await setUp();
    const dir = mkdtempSync(path.join(os.tmpdir(), "cantrove-install-"));
    const context = await chromium.launchPersistentContext(dir, { executablePath: "/usr/bin/chromium", args: CHROMIUM_FLAGS, baseURL: APP_URL, ...PHONE });
    try {
      const page = context.pages()[0] ?? (await context.newPage());
      await signInAs(page, g.emails.volunteer);
      await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 30_000 });
      const personId = await page.locator("[data-cantrove-person]").getAttribute("data-cantrove-person");
      await expect.poll(async () => (await kept(page, `cantrove-person-${personId}.${g.groupId}`)).paths, { timeout: 30_000 }).toContain("/log");
      const cdp = await context.newCDPSession(page);
      const manifest = (await cdp.send("Page.getAppManifest")) as { errors: unknown[]; data?: string };
      expect(manifest.errors).toEqual([]);
      expect(JSON.parse(manifest.data ?? "{}")).toMatchObject({ start_url: "/home", display: "standalone", id: "/home" });
      await expect
        .poll(async () => ((await cdp.send("Page.getInstallabilityErrors")) as { installabilityErrors: Array<{ errorId: string }> }).installabilityErrors.map((e) => e.errorId), { timeout: 15_000 })
        .toEqual([]);
      // The start URL leads a signed-in person to their own home page (the cold start offline is tested above).
      await page.goto("/home");
      await page.waitForURL(/\/log$/);
    } finally {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
