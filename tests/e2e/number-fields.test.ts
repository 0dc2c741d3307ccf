import { beforeAll, describe, expect, it } from "vitest";
import type { Locator, Page } from "playwright-core";
import { newPage, PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";

// Every count box on a phone takes exactly what was typed, or says why not:
// "−4" (a Unicode minus), "2.5" and "abc" are refused with the same message
// beside the box and nothing is saved; a whole number then saves exactly that.
const browser = browserForFile();
let g: FreshGroup;
beforeAll(async () => {
  g = await freshGroup("e2e-numbers");
});

const BAD_COUNTS = ["\u22124", "2.5", "abc"];
const countMessage = (noun: string) => `Enter a whole number of ${noun}, like`;
const movements = async (kind: string) => Number((await testDb()("movements").where({ drive_id: g.driveId, kind }).count({ n: "*" }).first())!.n);

/** Types each bad value into the box, tries to save, and checks the message, the box and the database. */
async function refusesBadCounts(page: Page, box: Locator, noun: string, save: () => Promise<void>, kind: string) {
  const before = await movements(kind);
  const id = await box.getAttribute("id");
  for (const bad of BAD_COUNTS) {
    await box.fill(bad);
    await save();
    const message = page.locator(`[id="${id}-error"]`);
    await expect.poll(() => message.innerText()).toContain(countMessage(noun));
    expect(await box.getAttribute("aria-invalid")).toBe("true");
    expect((await box.getAttribute("aria-describedby"))?.split(" ")).toContain(`${id}-error`);
    // Shown exactly as typed, never rewritten to 4, 25 or 0.
    expect(await box.inputValue()).toBe(bad);
    expect(await movements(kind)).toBe(before);
  }
  // A phone shows its number pad, and the browser keeps what is typed.
  expect(await box.getAttribute("inputmode")).toBe("numeric");
  expect(await box.getAttribute("type")).toBe("text");
}

describe("count boxes on the Log page", () => {
  it("refuses −4, 2.5 and abc in every haul, sort and processing count, then saves exactly what is typed", async () => {
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.goto(`/log?dropPoint=${g.dropPointIds[0]}`);
    const recordHaul = () => page.getByRole("button", { name: "Record haul" }).click();

    // Haul: bags, and the weight box (a decimal, so 2.5 is a weight; −4 and abc are not).
    const bags = page.getByLabel("Bags", { exact: true });
    await refusesBadCounts(page, bags, "bags", recordHaul, "haul");
    await bags.fill("2");
    const weight = page.getByLabel("Weight in kg (optional)");
    for (const bad of ["\u22124", "abc"]) {
      await weight.fill(bad);
      await recordHaul();
      await page.locator("#haul-weight-error").getByText("Enter a weight in kg, like 4.5.").waitFor();
      expect(await movements("haul")).toBe(0);
    }
    expect(await weight.getAttribute("inputmode")).toBe("decimal");
    await weight.fill("");
    await page.screenshot({ path: ".test-results/number-fields-haul.png", fullPage: true });
    await bags.fill(" 2 ");
    await recordHaul();
    await page.getByText(/Haul recorded: about \d+ cans/).waitFor();
    const hauls = await testDb()("hauls").where({ drive_id: g.driveId });
    expect(hauls.map((h) => [h.bags, h.weight_kg])).toEqual([[2, null]]);

    // Sort: good cans and every reject reason.
    await page.getByRole("tab", { name: "Log a sort" }).click();
    await page.getByRole("checkbox").first().check();
    const recordSort = () => page.getByRole("button", { name: "Record sort" }).click();
    await refusesBadCounts(page, page.getByLabel("Good cans", { exact: true }), "cans", recordSort, "sort");
    await page.getByLabel("Good cans", { exact: true }).fill("100");
    for (const reason of ["Dented", "Crushed", "Wrong size", "Not aluminium", "Torn or dirty", "Other"]) {
      const box = page.getByLabel(reason, { exact: true });
      await refusesBadCounts(page, box, "cans", recordSort, "sort");
      await box.fill("0");
    }
    await page.getByLabel("Dented", { exact: true }).fill("10");
    await recordSort();
    await page.getByText("Sort recorded: 100 good cans, 10 rejected.").waitFor();
    const sorts = await testDb()("sorts").where({ drive_id: g.driveId });
    expect(sorts.map((s) => s.good)).toEqual([100]);
    expect(sorts[0].rejected).toEqual({ dented: 10, crushed: 0, wrongSize: 0, notAluminium: 0, damaged: 0, other: 0 });

    // Processing: the batch and the cans lost on the way.
    await page.getByRole("tab", { name: "Log processing" }).click();
    await page.getByRole("radio", { name: "Washed" }).check({ force: true });
    const recordProcessing = () => page.getByRole("button", { name: "Record processing" }).click();
    const batch = page.getByLabel("Cans in this batch", { exact: true });
    await refusesBadCounts(page, batch, "cans", recordProcessing, "processing");
    await batch.fill("30");
    const lost = page.getByLabel("Cans lost", { exact: true });
    await refusesBadCounts(page, lost, "cans", recordProcessing, "processing");
    // The steppers step from a number, never from what is not one.
    expect(await page.getByRole("button", { name: "Cans lost: plus 1" }).isDisabled()).toBe(true);
    await lost.fill("0");
    await page.getByRole("button", { name: "Cans lost: plus 1" }).click();
    expect(await lost.inputValue()).toBe("1");
    await lost.fill("2");
    await page.screenshot({ path: ".test-results/number-fields-processing.png", fullPage: true });
    await recordProcessing();
    await page.getByText("Washed: 30 cans recorded, 2 lost (damaged in washing).").waitFor();
    const [moved] = await testDb()("ledger_lines")
      .join("movements", "movements.id", "ledger_lines.movement_id")
      .where({ "movements.drive_id": g.driveId, "movements.kind": "processing", "ledger_lines.to_stage": "washed" })
      .select("ledger_lines.quantity");
    expect(moved.quantity).toBe(30);
    expect(await movements("processing")).toBe(1);
    await context.close();
  });

  it("refuses the same input in the run stop's bags box, then logs exactly the bags typed", async () => {
    const org = await g.client("organiser");
    const volunteerId = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
    const created = await org.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn: "2026-12-11", start: { lat: 47.19, lng: -8 }, dropPointIds: [g.dropPointIds[1]], assigneeId: volunteerId });
    expect(created.status).toBe(201);
    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.goto(`/runs/${created.body.id}`);
    const stop = page.getByRole("listitem", { name: /^Stop \d+: South gate$/ });
    await stop.getByRole("button", { name: "Log the haul here" }).click();
    const save = () => stop.getByRole("button", { name: "Save the haul" }).click();
    const before = await movements("haul");
    await refusesBadCounts(page, stop.getByLabel("Bags", { exact: true }), "bags", save, "haul");
    // Empty is not 0 bags: it asks for the number.
    await stop.getByLabel("Bags", { exact: true }).fill("");
    await save();
    await stop.getByText("Enter a whole number of bags, like 3.").waitFor();
    expect(await movements("haul")).toBe(before);
    await stop.getByLabel("Bags", { exact: true }).fill("3");
    await save();
    await expect.poll(() => stop.getAttribute("data-status")).toBe("logged");
    const hauls = await testDb()("hauls").where({ drive_id: g.driveId, drop_point_id: g.dropPointIds[1] });
    expect(hauls.map((h) => h.bags)).toEqual([3]);
    await context.close();
  });
});

describe("a drive with no heaters planned", () => {
  it("says so on the public page and the dashboard, never 'Target reached' or '0 of 0'", async () => {
    const db = testDb();
    const slug = `no-heaters-${g.driveSlug}`;
    await db("drives").insert({ group_id: g.groupId, slug, name: "Empty Shelf Drive", starts_on: "2026-11-01", ends_on: "2027-02-28", is_public: true });
    const { context, page } = await newPage(browser(), PHONE);
    await page.goto(`/drives/${slug}`);
    await page.getByText("No heaters planned yet.").first().waitFor();
    const body = await page.locator("main").innerText();
    expect(body).not.toContain("Target reached");
    expect(body).not.toMatch(/of 0 heaters/);
    await page.screenshot({ path: ".test-results/number-fields-no-heaters.png", fullPage: true });
    await context.close();

    const desk = await signedInPage(browser(), g.emails.organiser, { viewport: { width: 1200, height: 900 } });
    await desk.page.goto("/dashboard");
    const card = desk.page.locator("section").filter({ has: desk.page.getByRole("link", { name: "Empty Shelf Drive" }) }).last();
    await card.getByTestId("heaters-covered").waitFor();
    expect(await card.getByTestId("heaters-covered").innerText()).toBe("No heaters planned yet");
    expect(await card.getByTestId("expected-finish").innerText()).toBe("No heaters planned yet");
    expect(await card.innerText()).toContain("0 drop points · 0 heater units");
    expect(await card.innerText()).not.toMatch(/0 of 0|Expected finish/);
    // The test group's own drive: two heaters, running, with a pace from today's sort.
    const running = desk.page.locator("section").filter({ has: desk.page.getByRole("link", { name: `Drive ${g.driveSlug.replace(/^drive-/, "")}` }) }).last();
    expect(await running.getByTestId("heaters-covered").innerText()).toBe("Good cans for 0 of 2 heaters");
    expect(await running.innerText()).toContain("2 drop points · 2 heater units");
    await desk.context.close();
  });
});
