import { describe, expect, it } from "vitest";
import { newPage, revealMaps, PHONE, signInAs, browserForFile } from "@/tests/support/browser";
import { ApiClient } from "@/tests/support/http";
import { freshGroup } from "@/tests/support/ledger";

// Bin fill as state, in the browser (issue 13): a full bin shows on the
// dashboard and as a shape on its map pin; a haul from it clears both.
const browser = browserForFile();

describe("full bins on the dashboard and the public map", () => {
  it("a haul clears a full bin; the organiser can clear another by hand", async () => {
    const g = await freshGroup("e2e-fill");
    const anon = new ApiClient();
    for (const dp of g.dropPointIds) {
      expect((await anon.json("POST", `/api/public/drives/${g.driveSlug}/drop-points/${dp}/fill-reports`, { level: 100 })).status).toBe(201);
    }

    const { context, page } = await newPage(browser(), PHONE);
    await page.goto(`/drives/${g.driveSlug}`);
    await revealMaps(page);
    const fullPins = page.locator('.leaflet-marker-icon svg[data-fill="full"]');
    await expect.poll(() => fullPins.count(), { timeout: 15_000 }).toBe(2);
    expect(await page.locator('[data-testid="fill"][data-fill="full"]').count()).toBe(2);
    expect(await page.getByTestId("drop-point").first().innerText()).toContain("Bin: reported full");

    const org = await context.newPage();
    await signInAs(org, g.emails.organiser);
    await org.goto("/dashboard");
    const bins = org.getByTestId("full-bin");
    await expect.poll(() => bins.count()).toBe(2);
    expect(await bins.first().innerText()).toMatch(/reported (just now|1 minute ago)/);

    const vol = await g.client("volunteer");
    expect((await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 5 })).status).toBe(201);

    await org.reload();
    await expect.poll(() => bins.count()).toBe(1);
    expect(await bins.first().innerText()).toContain("South gate");
    await page.reload();
    await revealMaps(page);
    await expect.poll(() => fullPins.count(), { timeout: 15_000 }).toBe(1);
    expect(await page.locator(".leaflet-marker-icon").count()).toBe(2);
    await page.screenshot({ path: ".test-results/bin-fill-map.png", fullPage: true });

    await bins.first().getByRole("button", { name: "Clear the full report for South gate" }).click();
    await expect.poll(() => bins.count()).toBe(0);
    await org.screenshot({ path: ".test-results/bin-fill-dashboard.png", fullPage: true });
    await org.reload();
    await org.getByRole("heading", { level: 1 }).waitFor();
    expect(await bins.count()).toBe(0);
    await page.reload();
    await revealMaps(page);
    await expect.poll(() => page.locator(".leaflet-marker-icon").count(), { timeout: 15_000 }).toBe(2);
    expect(await fullPins.count()).toBe(0);
    await context.close();
  });
});
