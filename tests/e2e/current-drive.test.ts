import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { addDrive, dayFromToday, freshGroup } from "@/tests/support/ledger";

// The drive a page opens on, on a phone: with next season's drive already set
// up, the log opens on the one running today and says so; a drive the person
// chooses is kept across reloads and across the pages where cans are entered.
const browser = browserForFile();

const runningName = "Chapel yard drive";
const futureName = "Next winter drive";

// A page under a loading.tsx streams its content into a hidden copy first and
// swaps it in; only the visible one is what the person sees and uses.
const visible = (page: Page, css: string) => page.locator(`${css}:visible`);
const bannerName = (page: Page) => visible(page, '[data-testid="current-drive-name"]').innerText();

/** Opens a page and waits until it is the live, hydrated one. */
async function open(page: Page, path: string) {
  await page.goto(path);
  await page.waitForLoadState("networkidle");
  await visible(page, '[data-testid="current-drive"]').waitFor();
}

/** Picks a drive in a select and waits until the choice is stored. */
async function choose(page: Page, select: string, driveId: string) {
  const stored = page.waitForResponse((r) => r.url().endsWith("/api/me/drive") && r.request().method() === "PUT");
  await visible(page, select).selectOption(driveId);
  expect((await stored).status()).toBe(200);
}

describe("the drive the log opens on", () => {
  it("is the running one, not next season's; a chosen drive stays chosen on reload and on the other pages", async () => {
    const g = await freshGroup("e2e-drive");
    await testDb()("drives").where({ id: g.driveId }).update({ name: runningName, starts_on: dayFromToday(-15), ends_on: dayFromToday(45) });
    const futureId = await addDrive(g, { name: futureName, startsOn: dayFromToday(100), endsOn: dayFromToday(190) });

    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await open(page, "/log");
    expect(await visible(page, "#log-drive").inputValue()).toBe(g.driveId);
    expect(await bannerName(page)).toBe(runningName);
    expect(await visible(page, '[data-testid="current-drive"]').innerText()).toMatch(/^Logging for: Chapel yard drive \(runs \d+ \w{3}/);
    expect(await page.getByTestId("current-drive-warning").count()).toBe(0);

    await choose(page, "#log-drive", futureId);
    await expect.poll(() => bannerName(page)).toBe(futureName);
    expect(await visible(page, '[data-testid="current-drive-warning"]').innerText()).toMatch(/^This drive starts on \d+ \w+ \d{4}\./);
    // The haul form now offers the chosen drive's drop point.
    expect(await visible(page, "#haul-drop-point").innerText()).toContain(`${futureName} porch`);

    await page.reload();
    await page.waitForLoadState("networkidle");
    await visible(page, '[data-testid="current-drive"]').waitFor();
    expect(await visible(page, "#log-drive").inputValue()).toBe(futureId);
    expect(await bannerName(page)).toBe(futureName);
    await page.goto("/home");
    await open(page, "/log");
    expect(await bannerName(page)).toBe(futureName);
    await context.close();

    // The organiser's own choice, made on the ledger, carries to the log and the run planner.
    const org = await signedInPage(browser(), g.emails.organiser, PHONE);
    await open(org.page, "/ledger");
    expect(await bannerName(org.page)).toBe(runningName);
    const stored = org.page.waitForResponse((r) => r.url().endsWith("/api/me/drive") && r.request().method() === "PUT");
    await org.page.getByRole("navigation", { name: "Drive" }).getByRole("link", { name: futureName }).click();
    expect((await stored).status()).toBe(200);
    await org.page.waitForURL((u) => u.searchParams.get("driveId") === futureId);
    await expect.poll(() => bannerName(org.page)).toBe(futureName);
    await open(org.page, "/log");
    expect(await visible(org.page, "#log-drive").inputValue()).toBe(futureId);
    await open(org.page, "/runs/new");
    expect(await visible(org.page, "#drive").inputValue()).toBe(futureId);
    expect(await bannerName(org.page)).toBe(futureName);
    await choose(org.page, "#drive", g.driveId);
    await open(org.page, "/ledger");
    expect(await bannerName(org.page)).toBe(runningName);
    await open(org.page, "/ledger/stock-count");
    expect(await bannerName(org.page)).toBe(runningName);
    await org.context.close();
  });
});
