import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";

// The Log page asks before recording an unusual number (and records it on Yes),
// and an entry kept offline is recorded at the time it was entered.
const browser = browserForFile();

const good = async (g: FreshGroup) => {
  const org = await g.client("organiser");
  return (await org.json<{ stages: Record<string, number> }>("GET", `/api/drives/${g.driveId}/stock`)).body.stages.good;
};

async function sortOf(page: Page, cans: number) {
  await page.getByRole("tab", { name: "Log a sort" }).click();
  await page.getByRole("checkbox").first().check();
  await page.getByLabel("Good cans", { exact: true }).fill(String(cans));
  await page.getByRole("button", { name: "Record sort" }).click();
}

describe("unusual numbers on the Log page", () => {
  it("asks 'really 1,000,000 cans from 1 bag?'; No records nothing, Yes records it", async () => {
    const g = await freshGroup("e2e-confirm");
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.goto(`/log?dropPoint=${g.dropPointIds[0]}`);
    await page.getByLabel("Bags", { exact: true }).fill("1");
    await page.getByRole("button", { name: "Record haul" }).click();
    await page.getByText(/Haul recorded: about 60 cans/).waitFor();

    await sortOf(page, 1_000_000);
    const ask = page.getByRole("alertdialog", { name: "Check this number" });
    await ask.getByText("That is 1,000,000 cans from 1 bag (about 60 expected). Is that right?").waitFor();
    await page.screenshot({ path: ".test-results/ledger-confirm-ask.png", fullPage: true });
    expect(await good(g)).toBe(0);
    await ask.getByRole("button", { name: "No, let me fix it" }).click();
    await ask.waitFor({ state: "detached" });
    expect(await page.getByLabel("Good cans", { exact: true }).inputValue()).toBe("1000000");
    expect(await good(g)).toBe(0);

    await page.getByRole("button", { name: "Record sort" }).click();
    await ask.getByRole("button", { name: "Yes, record it" }).click();
    await page.getByText("Sort recorded: 1000000 good cans, 0 rejected.").waitFor();
    expect(await good(g)).toBe(1_000_000);
    const sorts = await testDb()("sorts").where({ drive_id: g.driveId });
    expect(sorts.map((s) => s.good)).toEqual([1_000_000]);
    await context.close();
  });
});

describe("an entry kept offline", () => {
  it("is recorded at the time it was entered, and the ledger shows when it was sent", async () => {
    const g = await freshGroup("e2e-entry-time");
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.goto(`/log?dropPoint=${g.dropPointIds[0]}`);
    // One online visit: the offline worker is in control, with every chunk (the form's checks
    // included, which load at first use: hooks/use-lazy-schemas.ts) precached.
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 30_000 });
    // The phone's clock says T, 90 s before the server receives the entry.
    const T = new Date(Date.now() - 90_000);
    T.setMilliseconds(0);
    await page.clock.setFixedTime(T);
    await context.setOffline(true);
    await page.getByLabel("Bags", { exact: true }).fill("2");
    await page.getByRole("button", { name: "Record haul" }).click();
    await page.getByText(/waiting to be sent/).first().waitFor();
    await context.setOffline(false);
    await page.getByTestId("outbox").waitFor({ state: "detached", timeout: 20_000 });

    const m = await testDb()("movements").where({ drive_id: g.driveId, kind: "haul" }).first();
    expect(new Date(m.occurred_at).toISOString()).toBe(T.toISOString());
    expect(new Date(m.recorded_at).getTime() - T.getTime()).toBeGreaterThanOrEqual(60_000);
    await context.close();

    const org = await signedInPage(browser(), g.emails.organiser, { viewport: { width: 1200, height: 900 } });
    await org.page.goto(`/ledger?driveId=${g.driveId}`);
    await org.page.getByRole("cell", { name: /\d\d:\d\d\s*sent \d\d:\d\d/ }).first().waitFor();
    await org.context.close();
  });
});
