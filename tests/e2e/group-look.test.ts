import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, signInAs } from "@/tests/support/browser";
import { freshGroup } from "@/tests/support/ledger";

// An organiser switches the group to imperial in the settings form and the unit
// page then shows inches. The fresh group's plan is 30 × 60 in; 1 in = 25.4 mm exactly
// (NIST SP 811), so metric shows 762 × 1,524 mm.
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("group settings", () => {
  it("switching units to imperial shows the unit's glazing in inches", async () => {
    const g = await freshGroup("look-e2e");
    const { context, page } = await newPage(browser);
    await signInAs(page, g.emails.organiser);
    await page.goto(`/units/${g.heaterIds[0]}`);
    expect(await page.locator("main").innerText()).toContain("Glazing 762\u00a0mm × 1,524\u00a0mm");

    await page.goto("/organise/group");
    await page.getByRole("radio", { name: /Imperial/ }).check();
    // The sample follows the choice before saving: a length in inches to the eighth.
    await expect.poll(() => page.getByTestId("look-sample").innerText()).toContain("45⅞\u00a0in");
    await page.getByRole("button", { name: "Save" }).click();
    await page.getByText("Saved").waitFor();

    await page.goto(`/units/${g.heaterIds[0]}`);
    const main = await page.locator("main").innerText();
    expect(main).toContain("Glazing 30\u00a0in × 60\u00a0in");
    expect(main).not.toContain("762\u00a0mm");
    await context.close();
  });
});
