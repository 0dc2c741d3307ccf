import { describe, expect, it } from "vitest";
import { browserForFile, PHONE, signedInPage } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { freshGroupForFile } from "@/tests/support/ledger";

// The drop-point form's structured opening hours (issue 16), on a phone: days and times are
// saved as ISO 8601 weekday spans, stay ticked after the save, and a span with no day is refused.
const browser = browserForFile();
const g = freshGroupForFile("hours-form"); // its own drive: nothing added shows on the demo drive's public map

describe("opening hours on the drop-point form", () => {
  it("saves days and times, keeps them on screen, and refuses a span without a day", async () => {
    const db = testDb();
    const point = { id: g.dropPointIds[0]! };
    const { page, context } = await signedInPage(browser(), g.emails.organiser, PHONE);
    await page.goto(`/organise/drop-points/${point.id}`);
    await page.getByRole("button", { name: "Add opening times" }).click();
    const span = page.getByRole("group", { name: "Opening times 1" });
    for (const day of ["Monday", "Tuesday", "Wednesday"]) await span.getByRole("checkbox", { name: day }).check();
    await span.getByLabel("Opens").fill("08:00");
    await span.getByLabel("Closes").fill("12:30");
    await page.getByLabel("Notes on opening hours").fill("Ring the side bell");
    await page.getByRole("button", { name: "Save drop point" }).click();
    await expect.poll(async () => (await db("drop_points").where({ id: point.id }).first()).opening_hours).toEqual([{ days: [1, 2, 3], opens: "08:00", closes: "12:30" }]);
    expect((await db("drop_points").where({ id: point.id }).first()).hours).toBe("Ring the side bell");
    expect(await span.getByRole("checkbox", { name: "Tuesday" }).isChecked()).toBe(true);

    await page.reload();
    expect(await page.getByRole("group", { name: "Opening times 1" }).getByRole("checkbox", { name: "Wednesday" }).isChecked()).toBe(true);
    await page.getByRole("button", { name: "Add opening times" }).click();
    await page.getByRole("button", { name: "Save drop point" }).click();
    await page.getByText("Pick at least one day.").waitFor();
    expect((await db("drop_points").where({ id: point.id }).first()).opening_hours).toHaveLength(1);
    await context.close();
  });
});
