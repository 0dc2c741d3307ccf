import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { DEMO } from "@/tests/support/env";
import { ApiClient } from "@/tests/support/http";
import { testDb } from "@/tests/support/db";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { waitForMail } from "@/tests/support/mail";

// The pickup-run journey: an organiser plans a run over demo drop points and
// assigns it; the volunteer follows it on a phone, logs two hauls and skips a stop.
const WANTED = ["Hilltop Corner Shop", "Millbrook School gate", "Quayside Community Hall"];
const SHOTS = process.env.CANTROVE_SCREENSHOTS;

const browser = browserForFile();
const f = demoFixtureForFile();

const tallies = async () =>
  (await new ApiClient().json<Record<string, { hauls: number; bags: number }>>("GET", `/api/public/drives/${f.demoDriveSlug}/tallies`)).body;

/** Page object: the stop card on the volunteer's run page. */
const stopCard = (page: Page, name: string) => page.getByRole("listitem", { name: new RegExp(`^Stop \\d+: ${name}$`) });

describe("pickup run journey", () => {
  it("plans, assigns, follows on a phone, and moves tallies and the run's state", async () => {
    const points = await testDb()("drop_points").select("id", "name").where({ drive_id: f.demoDriveId, active: true });
    const idOf = (name: string) => points.find((p) => p.name === name)!.id as string;
    const startedAt = new Date();
    const before = await tallies();

    // Organiser plans the run.
    const { page, context } = await signedInPage(browser(), DEMO.organiser, { viewport: { width: 1200, height: 900 } });
    // Other suites may add drives that end later (the planner's default): name the demo drive.
    await page.goto(`/runs/new?drive=${f.demoDriveId}`);
    const picker = page.getByRole("group", { name: "Drop points to visit" });
    for (const name of WANTED) await picker.getByRole("checkbox", { name: new RegExp(name) }).waitFor();
    // Other suites may add drop points to the drive meanwhile: choose exactly the wanted ones among whatever is listed.
    for (const box of await picker.getByRole("checkbox").all()) {
      const label = (await box.locator("xpath=ancestor::label").innerText()) ?? "";
      await box.setChecked(WANTED.some((name) => label.includes(name)));
    }
    await page.getByLabel("Day of the run").fill("2026-12-12");
    await page.getByLabel("Volunteer", { exact: true }).selectOption({ label: "Tobin Ashgrove (volunteer)" });
    await page.getByTestId("route-length").waitFor();
    await expect.poll(() => page.locator(".leaflet-marker-icon").count()).toBe(3);
    await expect.poll(() => page.getByRole("list", { name: "Stops in order" }).getByRole("listitem").count()).toBe(4);
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/plan.png`, fullPage: true });
    await page.getByRole("button", { name: "Plan this run and tell the volunteer" }).click();
    await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
    const runId = page.url().split("/").pop()!;
    await context.close();

    const mail = await waitForMail(DEMO.volunteer, (m) => m.text.includes(`/runs/${runId}`));
    expect(mail.subject).toBe("Pickup run on 12 Dec 2026: 3 stops");
    const stored = await testDb()("pickup_run_stops").where({ run_id: runId }).orderBy("position").pluck("drop_point_id");
    expect([...stored].sort()).toEqual(WANTED.map(idOf).sort());

    // Volunteer on a phone.
    const phone = await signedInPage(browser(), DEMO.volunteer, PHONE);
    await phone.page.goto(`/runs/${runId}`);
    const v = phone.page;
    await expect.poll(() => v.getByRole("listitem", { name: /^Stop \d+:/ }).count()).toBe(3);
    for (const name of WANTED) await expect.poll(() => stopCard(v, name).getByText(/Hours/).count()).toBe(1);
    if (SHOTS) await v.screenshot({ path: `${SHOTS}/phone-run.png`, fullPage: true });

    const logHaul = async (name: string, bags: string) => {
      const card = stopCard(v, name);
      await card.getByRole("button", { name: "Log the haul here" }).click();
      await card.getByLabel("Bags").fill(bags);
      await card.getByRole("button", { name: "Save the haul" }).click();
      await card.getByText("Haul logged ✓").waitFor();
    };
    await logHaul("Hilltop Corner Shop", "2");
    await logHaul("Quayside Community Hall", "3");
    expect((await testDb()("pickup_runs").where({ id: runId }).first()).state).toBe("under_way");

    const skip = stopCard(v, "Millbrook School gate");
    await skip.getByRole("button", { name: "Skip with a reason" }).click();
    await skip.getByLabel("Why skip this stop?").fill("School closed for the holidays");
    await skip.getByRole("button", { name: "Skip this stop" }).click();
    await skip.getByText(/Skipped — “School closed for the holidays”/).waitFor();
    await v.getByText("Run done").waitFor();
    if (SHOTS) await v.screenshot({ path: `${SHOTS}/phone-done.png`, fullPage: true });
    await phone.context.close();

    // The run and the drive's tallies follow.
    const run = await testDb()("pickup_runs").where({ id: runId }).first();
    expect(run.state).toBe("done");
    // Other suites may log hauls on the same drive meanwhile, so each tally is
    // compared with every haul written at that point since the test began.
    const after = await tallies();
    const bagsSince = async (pointId: string) =>
      Number((await testDb()("hauls").where({ drop_point_id: pointId }).andWhere("recorded_at", ">=", startedAt).sum({ b: "bags" }).first())!.b ?? 0);
    const logged = await testDb()("pickup_run_stops as s").join("hauls as h", "h.id", "s.haul_id").where("s.run_id", runId).select("h.drop_point_id", "h.bags");
    expect(Object.fromEntries(logged.map((h) => [h.drop_point_id, h.bags]))).toEqual({
      [idOf("Hilltop Corner Shop")]: 2,
      [idOf("Quayside Community Hall")]: 3,
    });
    for (const name of WANTED) {
      const id = idOf(name);
      expect(after[id]!.bags - before[id]!.bags).toBe(await bagsSince(id));
    }
    const skipped = await testDb()("pickup_run_stops").where({ run_id: runId, drop_point_id: idOf("Millbrook School gate") }).first();
    expect(skipped.status).toBe("skipped");
    expect(skipped.haul_id).toBeNull();

    // The organiser sees the run among the done ones, and each drop point's pickup history.
    const org = await signedInPage(browser(), DEMO.organiser, { viewport: { width: 1200, height: 900 } });
    await org.page.goto("/runs");
    const card = (title: string) => org.page.locator("section", { has: org.page.getByRole("heading", { name: title, exact: true }) });
    const done = card("Done");
    // The run is named by its day in the group's style (CLDR en-GB medium date), not the ISO code.
    await done.getByRole("link", { name: /12 Dec 2026 · Tobin Ashgrove/ }).waitFor();
    const history = card("Pickup history by drop point");
    await history.getByText(/^Hilltop Corner Shop/).click();
    await history.getByText(/haul logged: 2 bags/).first().waitFor();
    await history.getByText(/^Millbrook School gate/).click();
    await history.getByText(/“School closed for the holidays”/).first().waitFor();
    if (SHOTS) await org.page.screenshot({ path: `${SHOTS}/runs-list.png`, fullPage: true });
    await org.context.close();
  });
});
