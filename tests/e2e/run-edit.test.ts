import { describe, expect, it } from "vitest";
import { browserForFile, signedInPage } from "@/tests/support/browser";
import { signedIn } from "@/tests/support/http";
import { testDb } from "@/tests/support/db";
import { freshGroupForFile } from "@/tests/support/ledger";
import { waitForMail } from "@/tests/support/mail";

// Issue 16: an organiser edits a run in the browser (sees the closed-stop warning,
// reassigns it, reorders a stop with the move buttons, removes one, re-optimises)
// and then cancels it; the run stays, cancelled, with its stops released. A group of its
// own, so the drop points it adds never show on the demo drive's public map.
const SHOTS = process.env.CANTROVE_SCREENSHOTS;
const browser = browserForFile();
const g = freshGroupForFile("run-edit-e2e");

describe("editing and cancelling a run", () => {
  it("reassigns, reorders, removes a stop, re-optimises and cancels, with warnings and mails", async () => {
    const db = testDb();
    // A weekend-only drop point of its own, so the Thursday run warns about it (2027-01-07 is a Thursday).
    const [hut] = await db("drop_points")
      .insert({
        group_id: g.groupId, drive_id: g.driveId, name: "Saturday market hut (journey)", lat: 47.201, lng: -8.012, hours: "Ring the bell",
        opening_hours: JSON.stringify([{ days: [6, 7], opens: "09:00", closes: "13:00" }]),
      })
      .returning("id");
    const others = await db("drop_points").where({ drive_id: g.driveId, active: true }).whereNot({ id: hut.id }).orderBy("name").limit(2).select("id", "name");
    const volunteerId = (await db("users").where({ email: g.emails.volunteer }).first()).id;
    const organiser = await db("users").where({ email: g.emails.organiser }).first();
    const api = await signedIn(g.emails.organiser);
    const created = await api.json<{ id: string }>("POST", "/api/runs", {
      driveId: g.driveId, plannedOn: "2027-01-07", start: { lat: 47.1978, lng: -8.0061 },
      dropPointIds: [hut.id, ...others.map((o) => o.id)], assigneeId: volunteerId,
    });
    expect(created.status).toBe(201);
    const runId = created.body.id;

    const { page, context } = await signedInPage(browser(), g.emails.organiser, { viewport: { width: 1366, height: 900 } });
    // The planner marks the hut on a Thursday, and not on a Saturday.
    await page.goto(`/runs/new?drive=${g.driveId}`);
    const hutChoice = page.getByRole("group", { name: "Drop points to visit" }).locator("label", { hasText: "Saturday market hut (journey)" });
    await hutChoice.waitFor();
    await page.getByLabel("Day of the run").fill("2027-01-07");
    await hutChoice.getByText("Closed on Thursdays by its opening hours").waitFor();
    await page.getByLabel("Day of the run").fill("2027-01-09");
    await expect.poll(() => hutChoice.getByText(/Closed on/).count()).toBe(0);

    await page.goto(`/runs/${runId}`);
    await expect.poll(() => page.getByTestId("run-warnings").innerText()).toContain("Saturday market hut (journey) is not open on Thursdays");
    await page.getByRole("listitem", { name: /Saturday market hut \(journey\)$/ }).getByText("Sat, Sun 09:00–13:00").waitFor();

    // Reassign to the organiser: both people get an e-mail.
    await page.getByLabel("Volunteer", { exact: true }).selectOption({ label: `${organiser.name} (organiser)` });
    await page.getByRole("button", { name: "Save the changes" }).click();
    await page.getByText("Saved.").waitFor();
    await waitForMail(g.emails.organiser, (m) => m.text.includes(`/runs/${runId}`) && m.subject.startsWith("Pickup run on"));
    await waitForMail(g.emails.volunteer, (m) => m.subject.includes("given to someone else") && m.text.includes("7 January 2027"));
    expect((await db("pickup_runs").where({ id: runId }).first()).assignee_id).toBe(organiser.id);

    // Reorder by hand: the last stop moves up one place.
    const stored = async () => db("pickup_run_stops").where({ run_id: runId }).orderBy("position").pluck("drop_point_id");
    const before = await stored();
    const reorder = page.getByRole("list", { name: "Stops to reorder" });
    const lastName = (await db("drop_points").where({ id: before[2] }).first()).name as string;
    await reorder.getByRole("button", { name: `Move ${lastName} up` }).click();
    await expect.poll(stored).toEqual([before[0], before[2], before[1]]);

    // Remove the weekend hut: the warning goes with it.
    await reorder.getByRole("button", { name: "Remove Saturday market hut (journey) from the run" }).click();
    await expect.poll(async () => (await stored()).length).toBe(2);
    await expect.poll(() => page.getByTestId("run-warnings").count()).toBe(0);
    await page.getByRole("button", { name: "Re-optimise the order" }).click();
    await page.getByText("Stops still to visit are now in the shortest order.").waitFor();
    if (SHOTS) await page.screenshot({ path: `${SHOTS}/run-edit-desktop.png`, fullPage: true });

    // Cancel, with a reason.
    await page.getByRole("button", { name: "Cancel this run…" }).click();
    await page.getByLabel("Why is it cancelled?").fill("Market moved indoors");
    await page.getByRole("button", { name: "Cancel the run" }).click();
    await page.getByText("Run cancelled", { exact: true }).waitFor();
    await expect.poll(() => page.getByRole("heading", { name: "Change this run" }).count()).toBe(0);
    const run = await db("pickup_runs").where({ id: runId }).first();
    expect(run.state).toBe("cancelled");
    expect(run.cancel_reason).toBe("Market moved indoors");
    expect(await db("pickup_run_stops").where({ run_id: runId }).pluck("status")).toEqual(["released", "released"]);

    // Still in the list, marked cancelled.
    await page.goto("/runs");
    await page.getByRole("link", { name: /7 Jan 2027/ }).first().waitFor();
    await context.close();
  });
});
