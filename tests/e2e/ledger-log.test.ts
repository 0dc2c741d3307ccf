import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";

// A volunteer on a phone: haul, sort with rejects, wash, open and punch part,
// undo one entry; the drive's stock and the public tallies must agree. Then the
// same with the network cut part-way, and with one answer lost on its way back.
const browser = browserForFile();

const stage = async (page: Page, name: string) => Number((await page.locator(`[data-stage="${name}"]`).innerText()).replace(/[^\d]/g, ""));

async function expectStage(page: Page, name: string, value: number) {
  await expect.poll(() => stage(page, name), { timeout: 10_000 }).toBe(value);
}

async function logHaul(page: Page, bags: number) {
  await page.getByRole("tab", { name: "Log a haul" }).click();
  await page.getByLabel("Bags", { exact: true }).fill(String(bags));
  await page.getByRole("button", { name: "Record haul" }).click();
}

async function logSort(page: Page, good: number, rejects: Record<string, number>) {
  await page.getByRole("tab", { name: "Log a sort" }).click();
  await page.getByRole("checkbox").first().check();
  await page.getByLabel("Good cans", { exact: true }).fill(String(good));
  for (const [label, n] of Object.entries(rejects)) await page.getByLabel(label, { exact: true }).fill(String(n));
  await page.getByRole("button", { name: "Record sort" }).click();
}

async function logProcessing(page: Page, step: string, quantity: number) {
  await page.getByRole("tab", { name: "Log processing" }).click();
  await page.getByRole("radio", { name: step }).check({ force: true });
  await page.getByLabel("Cans in this batch", { exact: true }).fill(String(quantity));
  await page.getByRole("button", { name: "Record processing" }).click();
}

async function apiStock(g: FreshGroup) {
  const org = await g.client("organiser");
  return (await org.json<{ stages: Record<string, number>; rejected: Record<string, number> }>("GET", `/api/drives/${g.driveId}/stock`)).body;
}

describe("volunteer logging on a phone", () => {
  it("logs a haul, sorts it with rejects, washes and punches part, undoes one entry", async () => {
    const g = await freshGroup("e2e");
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.goto(`/log?dropPoint=${g.dropPointIds[0]}`);
    await expect.poll(() => page.getByLabel("Drop point").inputValue()).toBe(g.dropPointIds[0]);
    await expect.poll(() => page.getByText("Sugary bins draw wasps").count()).toBe(1);

    await logHaul(page, 3);
    await page.getByText(/Haul recorded: about 180 cans/).waitFor();
    await expectStage(page, "hauled", 180);

    await logSort(page, 100, { Dented: 7, Crushed: 3 });
    await page.getByText("Sort recorded: 100 good cans, 10 rejected.").waitFor();
    await expectStage(page, "good", 100);
    await expectStage(page, "hauled", 0);

    await logProcessing(page, "Washed", 60);
    await page.getByText("Washed: 60 cans recorded.").waitFor();
    expect(await page.getByText("Gloves on: rims and dents cut.", { exact: false }).count()).toBe(1);
    await logProcessing(page, "Opened (tops off)", 50);
    await page.getByText("Opened (tops off): 50 cans recorded.").waitFor();
    await logProcessing(page, "Punched", 40);
    await page.getByText(/Punched: 40 cans recorded\. That batch needed 160 holes/).waitFor();
    expect(await page.getByText("Punching: eye protection and gloves").count()).toBe(1);

    await page.getByRole("button", { name: "Undo Punched: 40 cans" }).click();
    await expectStage(page, "punched", 0);
    await expectStage(page, "opened", 50);
    await expectStage(page, "washed", 10);
    await expectStage(page, "good", 40);
    await page.screenshot({ path: ".test-results/ledger-log-phone.png", fullPage: true });

    const stock = await apiStock(g);
    expect(stock.stages).toMatchObject({ hauled: 0, good: 40, washed: 10, opened: 50, punched: 0 });
    expect(stock.rejected).toMatchObject({ dented: 7, crushed: 3 });
    const tallies = await (await fetch(`${process.env.CANTROVE_APP_URL}/api/public/drives/${g.driveSlug}/tallies`)).json();
    expect(tallies[g.dropPointIds[0]]).toEqual({ hauls: 1, bags: 3, goodCans: 100, rejectedCans: 10 });
    expect(tallies[g.dropPointIds[1]]).toEqual({ hauls: 0, bags: 0, goodCans: 0, rejectedCans: 0 });
    await context.close();
  });

  it("loses and doubles nothing when the network drops part-way", async () => {
    const g = await freshGroup("e2e-offline");
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.goto(`/log?dropPoint=${g.dropPointIds[1]}`);
    await logHaul(page, 2);
    await page.getByText(/Haul recorded/).waitFor();

    // The sort is sent, the server records it, but the answer never arrives.
    let dropped = 0;
    await page.route("**/api/drives/*/sorts", async (route) => {
      if (dropped++ === 0) {
        await route.fetch();
        await route.abort("connectionreset");
      } else await route.continue();
    });
    await logSort(page, 100, { "Wrong size": 5 });
    await page.getByText(/entry is waiting to be sent/).waitFor();

    // Then the connection goes entirely; a wash is logged while offline.
    await context.setOffline(true);
    await logProcessing(page, "Washed", 30);
    await page.getByText(/waiting to be sent/).waitFor();
    await page.screenshot({ path: ".test-results/ledger-log-offline.png", fullPage: true });
    expect(await page.getByTestId("outbox").innerText()).toMatch(/Washed: 30 cans/);

    await context.setOffline(false);
    await page.getByTestId("outbox").waitFor({ state: "detached", timeout: 20_000 });
    await expectStage(page, "good", 70);
    await expectStage(page, "washed", 30);

    const db = testDb();
    const kinds = (await db("movements").where({ drive_id: g.driveId }).select("kind").count({ n: "*" }).groupBy("kind")) as { kind: string; n: string }[];
    expect(Object.fromEntries(kinds.map((k) => [k.kind, Number(k.n)]))).toEqual({ haul: 1, sort: 1, processing: 1 });
    const stock = await apiStock(g);
    expect(stock.stages).toMatchObject({ hauled: 0, good: 70, washed: 30 });
    expect(stock.rejected.wrongSize).toBe(5);
    await context.close();
  });
});
