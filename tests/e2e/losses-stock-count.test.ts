import { beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";
import { totalsMismatches } from "@/tests/support/ledger-totals";

// A volunteer records cans lost while washing on a phone; an organiser then
// counts what is on hand, posts the difference as one adjustment and undoes it.
const browser = browserForFile();
let g: FreshGroup;
beforeAll(async () => {
  g = await freshGroup("e2e-losses");
  await haulAndSort(await g.client("volunteer"), g.driveId, g.dropPointIds[0], 100, { dented: 5 });
});

type Stock = { stages: Record<string, number>; rejected: Record<string, number>; rejectedOnHand: number };
const apiStock = async () => (await (await g.client("organiser")).json<Stock>("GET", `/api/drives/${g.driveId}/stock`)).body;
const number = async (page: Page, selector: string) => Number((await page.locator(selector).innerText()).replace(/[^\d]/g, ""));

describe("losses and stock counts in the browser", () => {
  it("records cans lost while washing from the phone's processing form", async () => {
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.goto("/log");
    await page.getByRole("tab", { name: "Log processing" }).click();
    await page.getByRole("radio", { name: "Washed" }).check({ force: true });
    await page.getByLabel("Cans in this batch", { exact: true }).fill("60");
    await page.getByRole("group", { name: "Lost on the way" }).waitFor();
    expect(await page.getByLabel("How were they damaged?").inputValue()).toBe("damagedWashing");
    await page.getByRole("button", { name: "Cans lost: plus 1" }).click();
    await page.getByLabel("Cans lost", { exact: true }).fill("4");
    await page.getByRole("button", { name: "Record processing" }).click();
    await page.getByText("Washed: 60 cans recorded, 4 lost (damaged in washing).").waitFor();
    await expect.poll(() => number(page, '[data-stage="good"]'), { timeout: 10_000 }).toBe(36);
    await expect.poll(() => number(page, '[data-stage="washed"]')).toBe(60);
    await page.getByText("Washed: 60 cans, 4 lost").first().waitFor(); // the recent entry says so too
    await page.screenshot({ path: ".test-results/processing-loss-phone.png", fullPage: true });

    // Later steps offer their own reason first, and earlier steps' reasons, never a later one.
    await page.getByRole("radio", { name: "Opened (tops off)" }).check({ force: true });
    expect(await page.getByLabel("How were they damaged?").inputValue()).toBe("damagedOpening");
    expect(await page.locator("#processing-lost-reason option").allInnerTexts()).toEqual(["Damaged in washing", "Damaged in opening"]);

    const s = await apiStock();
    expect(s.stages).toMatchObject({ good: 36, washed: 60 });
    expect(s.rejected).toMatchObject({ dented: 5, damagedWashing: 4 });
    expect(s.rejectedOnHand).toBe(9);
    await context.close();
  });

  it("lets the organiser count what is on hand, post the difference as one entry, and undo it", async () => {
    const { context, page } = await signedInPage(browser(), g.emails.organiser, { viewport: { width: 1280, height: 900 } });
    await page.goto(`/ledger?drive=${g.driveId}`);
    await page.getByRole("link", { name: "Count what is on hand (stock count)" }).click();
    await page.waitForURL(/\/ledger\/stock-count/);
    await expect.poll(() => number(page, '[data-total="good"]'), { timeout: 10_000 }).toBe(36);
    expect(await number(page, '[data-total="washed"]')).toBe(60);
    expect(await number(page, '[data-total="rejected"]')).toBe(9);

    await page.getByLabel("Good, not washed").fill("30");
    await page.getByLabel("Washed", { exact: true }).fill("61");
    await page.getByLabel("Opened", { exact: true }).fill("0");
    expect(await page.locator('[data-difference="good"]').innerText()).toBe("−6");
    expect(await page.locator('[data-difference="washed"]').innerText()).toBe("+1");
    expect(await page.locator('[data-difference="opened"]').innerText()).toBe("matches");

    // Typed text is never turned into another number: "2.5" is refused, not saved as 25.
    await page.getByLabel("Punched", { exact: true }).fill("2.5");
    await page.getByLabel("Why does it differ?").fill("Shelf recount after the wash day");
    await page.getByRole("button", { name: "Post the difference" }).click();
    await page.getByText("Enter a whole number of cans, like 120.").waitFor();
    await page.getByLabel("Punched", { exact: true }).fill("");
    await page.getByRole("button", { name: "Post the difference" }).click();
    await page.getByText("Stock count posted as one adjustment: good, not washed −6, washed +1.").waitFor();
    await expect.poll(() => number(page, '[data-total="good"]')).toBe(30);
    await page.screenshot({ path: ".test-results/stock-count-organiser.png", fullPage: true });
    // On a phone the count table still fits the screen (no sideways scrolling).
    await page.setViewportSize(PHONE.viewport);
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await page.screenshot({ path: ".test-results/stock-count-phone.png", fullPage: true });
    await page.setViewportSize({ width: 1280, height: 900 });

    const kinds = await testDb()("movements").where({ drive_id: g.driveId, kind: "stockCount" }).select("id");
    expect(kinds).toHaveLength(1);
    expect((await apiStock()).stages).toMatchObject({ good: 30, washed: 61 });

    await page.getByRole("button", { name: "Undo this count" }).click();
    await page.getByText("Undone: the running totals are back to what they were.").waitFor();
    await expect.poll(() => number(page, '[data-total="good"]')).toBe(36);
    expect((await apiStock()).stages).toMatchObject({ good: 36, washed: 60 });
    expect(await totalsMismatches(testDb(), g.groupId)).toEqual([]);
    await context.close();
  });
});
