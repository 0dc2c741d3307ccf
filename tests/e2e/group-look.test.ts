import { describe, expect, it } from "vitest";
import { browserForFile, newPage, signInAs } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { freshGroup } from "@/tests/support/ledger";

// An organiser switches the group to imperial in the settings form and the unit
// page then shows inches. The fresh group's plan is 30 × 60 in; 1 in = 25.4 mm exactly
// (NIST SP 811), so metric shows 762 × 1,524 mm. A weight is then typed in pounds:
// 1 lb = 0.45359237 kg exactly (same source), so 10 lb is stored as 4.536 kg.
const browser = browserForFile();

describe("group settings", () => {
  it("switching units to imperial shows the unit's glazing in inches", async () => {
    const g = await freshGroup("look-e2e");
    const { context, page } = await newPage(browser());
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

    // The log's weight box now speaks pounds; the haul is stored in kilograms.
    // (5 bags for 10 lb of cans, about what five bags of cans weigh, so the log does not ask about the number.)
    await page.goto(`/log?dropPoint=${g.dropPointIds[0]}`);
    await page.getByLabel("Bags", { exact: true }).fill("5");
    await page.getByLabel("Weight in lb (optional)").fill("10");
    await page.getByRole("button", { name: "Record haul" }).click();
    await page.getByText(/Haul recorded/).waitFor();
    expect((await testDb()("hauls").where({ group_id: g.groupId }).pluck("weight_kg")).map(Number)).toEqual([4.536]);
    await context.close();
  });
});
