import http from "node:http";
import type { AddressInfo } from "node:net";
import { describe, expect, it } from "vitest";
import { kept } from "@/tests/support/offline-caches";
import type { BrowserContext, Page } from "playwright-core";
import { PHONE, browserForFile, newPage, signInAs } from "@/tests/support/browser";
import { APP_URL } from "@/tests/support/env";
import { testDb } from "@/tests/support/db";
import { freshGroup, volunteerInTwoGroups, type FreshGroup } from "@/tests/support/ledger";
import { OFFLINE_TILE_BUDGET } from "@/lib/offline/tiles";

// What the service worker (app/sw.ts) keeps, and for whom: an answer still on its
// way when the person on the phone changes is kept for nobody; copies are filed
// under the person AND their group; the tile budget holds over everything kept;
// moving between pages does not fetch each again; a refused entry can be
// corrected in place; leaving a group warns about entries not yet sent.
const browser = browserForFile();


async function idOf(g: FreshGroup, who: "volunteer" | "volunteer2"): Promise<string> {
  return (await (await g.client(who)).json<{ user: { id: string } }>("GET", "/api/me")).body.user.id;
}

async function runFor(g: FreshGroup, assigneeId: string): Promise<string> {
  const org = await g.client("organiser");
  const plannedOn = new Date(Date.now() + 2 * 86_400_000).toISOString().slice(0, 10);
  const run = await org.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn, start: { lat: 47.199, lng: -8.001 }, dropPointIds: g.dropPointIds, assigneeId });
  if (run.status !== 201) throw new Error(`run not created: ${run.status}`);
  return run.body.id;
}

/** Signed in as `who` on the proxy's origin (cookies are per host, not per port). */
async function useSessionOf(context: BrowserContext, g: FreshGroup, who: "volunteer" | "volunteer2") {
  const client = await g.client(who);
  await context.addCookies(
    client
      .cookie()
      .split("; ")
      .map((pair) => {
        const eq = pair.indexOf("=");
        return { name: pair.slice(0, eq), value: pair.slice(eq + 1), domain: "127.0.0.1", path: "/" };
      }),
  );
}

/**
 * A small proxy in front of the app that can hold back one answer: the server has
 * answered (for whoever was signed in then) but the phone has not got it yet, as on
 * a slow line. Neither Playwright's routing nor Chromium's Fetch domain sees the
 * service worker's own requests, hence a proxy.
 */
async function holdingProxy() {
  const app = new URL(APP_URL);
  let rule: { path: string; arrived: () => void; released: Promise<void> } | null = null;
  const server = http.createServer((req, res) => {
    const path = new URL(req.url ?? "/", "http://x").pathname;
    const held = rule && rule.path === path ? rule : null;
    if (held) rule = null;
    const up = http.request({ host: app.hostname, port: app.port, path: req.url, method: req.method, headers: req.headers }, (answer) => {
      if (!held) {
        res.writeHead(answer.statusCode ?? 502, answer.headers);
        answer.pipe(res);
        return;
      }
      const parts: Buffer[] = [];
      answer.on("data", (c: Buffer) => parts.push(c));
      answer.on("end", () => {
        held.arrived();
        void held.released.then(() => {
          res.writeHead(answer.statusCode ?? 502, answer.headers);
          res.end(Buffer.concat(parts));
        });
      });
    });
    up.on("error", () => res.destroy());
    req.pipe(up);
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  return {
    origin: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    /** Holds the next answer to `path` once the server has made it; `release()` lets it go on. */
    hold(path: string) {
      let arrived!: () => void;
      let release!: () => void;
      const got = new Promise<void>((r) => (arrived = r));
      const released = new Promise<void>((r) => (release = r));
      rule = { path, arrived, released };
      return { arrived: got, release };
    },
    close: () => new Promise((resolve) => server.close(resolve)),
  };
}

const inControl = (page: Page) => page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 30_000 });

/** The worker's warm-up, asked for now (as a signed-in page's hello does every few minutes), awaited to its end. */
async function warmNow(page: Page, person: { id: string; group: string }, wait = true) {
  await page.evaluate(
    async ({ person, wait }) => {
      const done = new Promise<void>((resolve) => {
        navigator.serviceWorker.addEventListener("message", (e) => {
          if ((e.data as { type?: string } | null)?.type === "CANTROVE_WARMED") resolve();
        });
      });
      (await navigator.serviceWorker.ready).active!.postMessage({ type: "CANTROVE_PERSON", person: { ...person, home: "/log" }, tileUrl: "/tiles/{z}/{x}/{y}.png", force: true });
      if (wait) await done;
    },
    { person, wait },
  );
}

describe("answers on their way when the person on the phone changes", () => {
  it("an answer made for one person, arriving after someone else signed in, is kept for nobody", async () => {
    const g = await freshGroup("keep-race");
    const aId = await idOf(g, "volunteer");
    const bId = await idOf(g, "volunteer2");
    const proxy = await holdingProxy();
    const { context, page } = await newPage(browser(), { ...PHONE, baseURL: proxy.origin });
    try {
      await useSessionOf(context, g, "volunteer");
      await page.goto("/log");
      await inControl(page);
      await expect.poll(async () => (await kept(page, `cantrove-person-${aId}.${g.groupId}`)).paths, { timeout: 30_000 }).toContain("/log");
      // A read of the first person's entries, answered by the server but still on the line.
      const held = proxy.hold("/api/ledger");
      await page.evaluate(() => {
        (window as Window & { late?: Promise<number> }).late = fetch("/api/ledger?mine=1").then((r) => r.status);
      });
      await held.arrived;
      // Meanwhile the phone changes hands: someone else's session, and their page seen by the worker.
      await context.clearCookies();
      await useSessionOf(context, g, "volunteer2");
      const other = await context.newPage();
      await other.goto("/log");
      await expect.poll(async () => (await kept(other, `cantrove-person-${bId}.${g.groupId}`)).paths, { timeout: 30_000 }).toContain("/log");
      await expect.poll(async () => (await kept(other, "")).names.filter((n) => n.includes(aId))).toEqual([]);
      held.release();
      expect(await page.evaluate(() => (window as Window & { late?: Promise<number> }).late)).toBe(200);
      await new Promise((r) => setTimeout(r, 1500));
      const after = await kept(other, `cantrove-person-${bId}.${g.groupId}`);
      // Not put back under the first person, and not filed under the second: every answer kept is the second person's own.
      expect(after.names.filter((n) => n.includes(aId))).toEqual([]);
      const whose = await other.evaluate(async (name) => {
        const cache = await caches.open(name);
        const out: string[] = [];
        for (const req of await cache.keys()) if (new URL(req.url).pathname.startsWith("/api/")) out.push((await cache.match(req))?.headers.get("x-cantrove-for") ?? "none");
        return out;
      }, `cantrove-person-${bId}.${g.groupId}`);
      expect(whose.length).toBeGreaterThan(0);
      expect(new Set(whose)).toEqual(new Set([bId]));
    } finally {
      await context.close();
      await proxy.close();
    }
  });

  it("a warm-up still running when the person signs out keeps nothing of theirs afterwards", async () => {
    const g = await freshGroup("keep-warm");
    const aId = await idOf(g, "volunteer");
    await runFor(g, aId);
    const proxy = await holdingProxy();
    const { context, page } = await newPage(browser(), { ...PHONE, baseURL: proxy.origin });
    try {
      await useSessionOf(context, g, "volunteer");
      await page.goto("/log");
      await inControl(page);
      await expect.poll(async () => (await kept(page, `cantrove-person-${aId}.${g.groupId}`)).paths, { timeout: 30_000 }).toContain("/api/runs");
      // The next warm-up's list of runs is answered, then held on the line.
      const held = proxy.hold("/api/runs");
      await warmNow(page, { id: aId, group: g.groupId }, false);
      await held.arrived;
      await page.getByRole("button", { name: "Sign out" }).click();
      const look = await context.newPage();
      await look.goto("/signin");
      await expect.poll(async () => (await kept(look, "")).names.filter((n) => n.includes(aId)), { timeout: 15_000 }).toEqual([]);
      held.release();
      await new Promise((r) => setTimeout(r, 3000));
      expect((await kept(look, "")).names.filter((n) => n.includes(aId))).toEqual([]);
    } finally {
      await context.close();
      await proxy.close();
    }
  });
});

describe("a person in two groups", () => {
  it("after switching group, the phone keeps none of the other group's pages", async () => {
    const { a, b, userId, nameA: groupA, nameB: groupB } = await volunteerInTwoGroups("keep-group", "volunteer");
    const runA = await runFor(a, userId);
    const { context, page } = await newPage(browser(), PHONE);
    try {
      await signInAs(page, a.emails.volunteer);
      await inControl(page);
      await expect.poll(async () => (await kept(page, `cantrove-person-${userId}.${a.groupId}`)).paths, { timeout: 30_000 }).toContain(`/runs/${runA}`);
      await page.getByLabel("Active group").selectOption({ label: `${groupB} (volunteer)` });
      await page.getByRole("banner").getByText(groupB, { exact: true }).waitFor({ timeout: 15_000 });
      await expect.poll(async () => (await kept(page, `cantrove-person-${userId}.${b.groupId}`)).paths, { timeout: 30_000 }).toContain("/log");
      await expect.poll(async () => (await kept(page, "")).names.filter((n) => n.includes(a.groupId)), { timeout: 15_000 }).toEqual([]);
      for (const p of context.pages()) await p.close();

      await context.setOffline(true);
      const off = await context.newPage();
      await off.goto(`/runs/${runA}`);
      await off.getByRole("heading", { name: "No connection" }).waitFor();
      await off.goto("/log");
      await off.getByTestId("offline-notice").waitFor();
      await off.getByRole("banner").getByText(groupB, { exact: true }).waitFor();
      expect(await off.content()).not.toContain(groupA);
    } finally {
      await context.close();
    }
  });
});

describe("the tile budget", () => {
  it("holds over every tile kept, the map's own and the warm-up's, and keeps the run's tiles first", async () => {
    const g = await freshGroup("keep-tiles");
    const id = await idOf(g, "volunteer");
    await runFor(g, id);
    const cacheName = `cantrove-tiles-${id}.${g.groupId}`;
    const { context, page } = await newPage(browser(), PHONE);
    try {
      await signInAs(page, g.emails.volunteer);
      await inControl(page);
      await expect.poll(async () => (await kept(page, cacheName)).paths.length, { timeout: 30_000 }).toBeGreaterThan(20);
      // Let the first warm-up end, then read what it chose.
      await warmNow(page, { id, group: g.groupId });
      const runTiles = (await kept(page, cacheName)).paths;
      // A full budget of other tiles, kept before (as by panning the map across town).
      await page.evaluate(
        async ({ name, n }) => {
          const cache = await caches.open(name);
          for (let i = 0; i < n; i++) await cache.put(new URL(`/tiles/18/${i}/0.png`, location.origin).href, new Response(new Uint8Array(8), { headers: { "content-type": "image/png" } }));
        },
        { name: cacheName, n: OFFLINE_TILE_BUDGET },
      );
      await warmNow(page, { id, group: g.groupId });
      const after = (await kept(page, cacheName)).paths;
      expect(after.length).toBeLessThanOrEqual(OFFLINE_TILE_BUDGET);
      expect(after).toEqual(expect.arrayContaining(runTiles));
    } finally {
      await context.close();
    }
  });
});

describe("moving between pages", () => {
  it("does not fetch a page again for the offline copy when this person's copy is fresh", async () => {
    const g = await freshGroup("keep-nav");
    const id = await idOf(g, "volunteer");
    const cacheName = `cantrove-person-${id}.${g.groupId}`;
    const { context, page } = await newPage(browser(), PHONE);
    const madeAt = (path: string) =>
      page.evaluate(
        async ({ name, path }) => {
          const res = await (await caches.open(name)).match(new URL(path, location.origin).href);
          return /data-rendered-at="([^"]+)"/.exec((await res?.text()) ?? "")?.[1] ?? null;
        },
        { name: cacheName, path },
      );
    try {
      await signInAs(page, g.emails.volunteer);
      await inControl(page);
      await expect.poll(async () => (await kept(page, cacheName)).paths, { timeout: 30_000 }).toEqual(expect.arrayContaining(["/log", "/runs"]));
      // The first visit's own copies (the warm-up's and the page's) settle first.
      await page.waitForTimeout(3000);
      const runsAt = await madeAt("/runs");
      const logAt = await madeAt("/log");
      expect(runsAt).not.toBeNull();
      const nav = page.getByRole("navigation", { name: "Group" });
      await nav.getByRole("link", { name: "My runs" }).click();
      await page.waitForURL(/\/runs$/);
      await nav.getByRole("link", { name: "Log" }).click();
      await page.waitForURL(/\/log$/);
      // A page not kept yet is still kept when reached inside the app (so the messages did arrive).
      await nav.getByRole("link", { name: "My settings" }).click();
      await page.waitForURL(/\/account$/);
      await expect.poll(async () => (await kept(page, cacheName)).paths, { timeout: 15_000 }).toContain("/account");
      expect(await madeAt("/runs")).toBe(runsAt);
      expect(await madeAt("/log")).toBe(logAt);
    } finally {
      await context.close();
    }
  });
});

/** An entry put on this phone's queue as the Log page does (lib/offline/store.ts), to be sent by the page. */
async function queueEntry(page: Page, entry: Record<string, unknown>) {
  await page.evaluate(
    (e) =>
      new Promise<void>((resolve, reject) => {
        const open = indexedDB.open("cantrove-offline");
        open.onsuccess = () => {
          const tx = open.result.transaction("outbox", "readwrite");
          tx.objectStore("outbox").put(e);
          tx.oncomplete = () => resolve();
          tx.onerror = () => reject(tx.error);
        };
      }),
    entry,
  );
}

describe("a refused entry", () => {
  it("is corrected where it is listed and sent again, recorded once at the time it was entered", async () => {
    const g = await freshGroup("keep-fix");
    const id = await idOf(g, "volunteer");
    const { context, page } = await newPage(browser(), PHONE);
    try {
      await signInAs(page, g.emails.volunteer);
      await inControl(page);
      // Entered 20 minutes ago, with a number the server refuses (more bags than one pickup holds).
      const enteredAt = new Date(Date.now() - 20 * 60_000);
      enteredAt.setMilliseconds(0);
      const at = enteredAt.toISOString();
      await queueEntry(page, {
        key: crypto.randomUUID(),
        url: `/api/drives/${g.driveId}/hauls`,
        body: { happenedAt: at, dropPointId: g.dropPointIds[0], bags: 600 },
        label: "Haul: 600 bags from North porch",
        createdAt: at,
        attempts: 0,
        owner: id,
        seq: 1,
        state: "waiting",
      });
      await page.reload();
      const refused = page.getByRole("alert").filter({ hasText: "Not recorded: Haul: 600 bags" });
      await refused.waitFor({ timeout: 20_000 });
      await refused.getByRole("button", { name: "Fix it" }).click();
      const bags = refused.getByLabel("Bags", { exact: true });
      expect(await bags.inputValue()).toBe("600");
      // The server's word on the field, not only its summary.
      await refused.getByText("Bags: That is more bags than one pickup holds.").waitFor();
      await bags.fill("6");
      await refused.getByRole("button", { name: "Send again" }).click();
      const db = testDb();
      await expect.poll(async () => db("hauls").where({ drive_id: g.driveId }).pluck("bags"), { timeout: 20_000 }).toEqual([6]);
      await page.getByTestId("outbox").waitFor({ state: "detached", timeout: 20_000 });
      const move = await db("movements").where({ drive_id: g.driveId, kind: "haul" }).first();
      expect(new Date(move.occurred_at).toISOString()).toBe(at);
    } finally {
      await context.close();
    }
  });
});

describe("leaving the group", () => {
  it("warns first that entries on this phone not yet sent will be deleted", async () => {
    const g = await freshGroup("keep-leave");
    const id = await idOf(g, "volunteer");
    const { context, page } = await newPage(browser(), PHONE);
    try {
      await signInAs(page, g.emails.volunteer);
      await inControl(page);
      await expect.poll(async () => (await kept(page, `cantrove-person-${id}.${g.groupId}`)).paths, { timeout: 30_000 }).toContain("/log");
      const at = new Date().toISOString();
      await queueEntry(page, {
        key: crypto.randomUUID(),
        url: `/api/drives/${g.driveId}/hauls`,
        body: { happenedAt: at, dropPointId: g.dropPointIds[0], bags: 600 },
        label: "Haul: 600 bags from North porch",
        createdAt: at,
        attempts: 0,
        owner: id,
        seq: 1,
        state: "refused",
        refusal: { status: 422, message: "Some fields need another look." },
      });
      await page.goto("/account");
      await page.getByRole("button", { name: "Leave this group" }).click();
      await page.getByText("1 entry has not been sent yet").waitFor();
      expect(await page.getByTestId("leave-unsent").innerText()).toMatch(/deletes it from this phone/);
      await page.getByRole("button", { name: /^Yes, leave .* and delete it$/ }).waitFor();
      await page.getByRole("button", { name: "Stay" }).click();
      expect(await testDb()("memberships").where({ group_id: g.groupId, user_id: id }).count<{ n: string }[]>({ n: "*" })).toEqual([{ n: "1" }]);
    } finally {
      await context.close();
    }
  });
});
