import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { newPage, signInAs, browserForFile } from "@/tests/support/browser";
import { DEMO } from "@/tests/support/env";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { testDb } from "@/tests/support/db";
import { planColumns } from "@/lib/heaters/plan-columns";

// Issue 16: a throwaway test unit raised the drive's target for good. An
// organiser archives it from its page (with a confirmation) and sees the
// drive's target on /units fall back to what it was before the unit.
const browser = browserForFile();
let page: Page;
let unitId: string;
const f = demoFixtureForFile();

beforeAll(async () => {
  ({ page } = await newPage(browser()));
});
afterAll(async () => {
  // The unit stays archived; nothing of it is in the ledger, so removing it loses no history.
  if (unitId) await testDb()("heater_units").where({ id: unitId }).del();
});

/** The drive's target line on /units: "Target X cans: Y for N heaters + S spare". */
async function driveTarget(): Promise<{ cans: number; heaters: number }> {
  await page.goto("/units");
  const text = await page.locator("#main").getByTestId(`drive-target-${f.demoDriveSlug}`).innerText();
  const m = /Target ([\d,]+) cans: [\d,]+ for (\d+) heaters?/.exec(text);
  if (!m) throw new Error(`unexpected target line: ${text}`);
  return { cans: Number(m[1].replace(/,/g, "")), heaters: Number(m[2]) };
}

describe("an organiser archives a test unit", () => {
  it("and the drive's target falls back", async () => {
    await signInAs(page, DEMO.organiser);
    const before = await driveTarget();
    const organiser = await testDb()("users").where({ email: DEMO.organiser }).first("id");
    const [row] = await testDb()("heater_units")
      .insert({ group_id: f.demoGroupId, drive_id: f.demoDriveId, builder_id: organiser.id, name: "Throwaway test unit", ...planColumns({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" }), columns: 11, rows: 12, cans: 132 })
      .returning("id");
    unitId = row.id;
    const raised = await driveTarget();
    expect(raised.heaters).toBe(before.heaters + 1);
    expect(raised.cans).toBeGreaterThan(before.cans);

    await page.goto(`/units/${unitId}`);
    await page.getByRole("button", { name: "Archive this unit…" }).click();
    await page.getByRole("button", { name: "Yes, archive it" }).click();
    await page.getByText("This unit is archived").waitFor();

    expect(await driveTarget()).toEqual(before);
    // Listed under the archived units, not with the drive's.
    const shelf = page.locator("#main").getByTestId("archived-units");
    await shelf.getByText(/Archived units/).click();
    await expect(shelf.getByRole("link", { name: "Throwaway test unit" }).count()).resolves.toBe(1);
  });
});
