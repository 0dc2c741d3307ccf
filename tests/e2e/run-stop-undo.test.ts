import { describe, expect, it } from "vitest";
import { PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { freshGroup } from "@/tests/support/ledger";

// On the run page: an unusual haul is asked about, a logged stop's haul can be
// undone (the stop opens again), and a skipped stop can be put back on the run.
const browser = browserForFile();

describe("a run's stops follow their hauls", () => {
  it("asks about 40 bags, undoes the haul back to pending, and un-skips a stop", async () => {
    const g = await freshGroup("e2e-run-undo");
    const org = await g.client("organiser");
    const volunteerId = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
    const created = await org.json<{ id: string }>("POST", "/api/runs", { driveId: g.driveId, plannedOn: "2026-12-11", start: { lat: 47.19, lng: -8 }, dropPointIds: g.dropPointIds, assigneeId: volunteerId });
    expect(created.status).toBe(201);
    const runId = created.body.id;

    const { context, page } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.goto(`/runs/${runId}`);
    const north = page.getByRole("listitem", { name: /^Stop \d+: North porch$/ });
    const south = page.getByRole("listitem", { name: /^Stop \d+: South gate$/ });

    await north.getByRole("button", { name: "Log the haul here" }).click();
    await north.getByLabel("Bags", { exact: true }).fill("40");
    await north.getByRole("button", { name: "Save the haul" }).click();
    await north.getByRole("alertdialog").getByText("That is 40 bags from a bin that holds 6 bags. Is that right?").waitFor();
    expect(await testDb()("hauls").where({ drive_id: g.driveId }).count({ n: "*" }).first()).toEqual({ n: "0" });
    await north.getByRole("button", { name: "Yes, record it" }).click();
    await expect.poll(() => north.getAttribute("data-status")).toBe("logged");

    await south.getByRole("button", { name: "Skip with a reason" }).click();
    await south.getByLabel("Why skip this stop?").fill("Gate locked");
    await south.getByRole("button", { name: "Skip this stop" }).click();
    await expect.poll(() => south.getAttribute("data-status")).toBe("skipped");
    await page.getByText("Run done").waitFor();

    await south.getByRole("button", { name: "Put South gate back on the run" }).click();
    await expect.poll(() => south.getAttribute("data-status")).toBe("pending");
    await south.getByRole("button", { name: "Log the haul here" }).waitFor();

    await north.getByRole("button", { name: "Undo this haul" }).click();
    await north.getByRole("button", { name: "Yes, undo it" }).click();
    await expect.poll(() => north.getAttribute("data-status"), { timeout: 10_000 }).toBe("pending");
    await north.getByRole("button", { name: "Log the haul here" }).waitFor();
    await page.screenshot({ path: ".test-results/run-stop-undo.png", fullPage: true });
    const run = await testDb()("pickup_runs").where({ id: runId }).first();
    expect(run.state).toBe("planned");
    expect(run.finished_at).toBeNull();
    await context.close();
  });
});
