import { describe, expect, it } from "vitest";
import { browserForFile, signedInPage } from "@/tests/support/browser";
import { freshGroup } from "@/tests/support/ledger";
import { testDb } from "@/tests/support/db";

// The ledger screen (issue 13): an organiser undoes a volunteer's wrong entry
// with a confirmation and a reason; line numbers show where lines are named;
// filters live in the address, so Back brings the previous view.
const browser = browserForFile();

describe("organiser corrections on /ledger", () => {
  it("reverses a volunteer's line with a reason, shows both line numbers, keeps filters in the URL", async () => {
    const g = await freshGroup("e2e-correct");
    const vol = await g.client("volunteer");
    const wrong = await vol.json<{ id: string; movementId: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[1], bags: 4 });
    expect(wrong.status).toBe(201);
    const kept = await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 1 });
    expect(kept.status).toBe(201);

    const { context, page } = await signedInPage(browser(), g.emails.organiser, { viewport: { width: 1280, height: 900 } });
    await page.goto(`/ledger?driveId=${g.driveId}`);
    const lines = page.locator("tr[data-line]");
    await expect.poll(() => lines.count(), { timeout: 15_000 }).toBe(2);
    const lineNo = await page.locator("tr[data-line]", { hasText: "South gate" }).getAttribute("data-line");
    // After the undo two lines name South gate; keep to this one by its number.
    const wrongLine = page.locator(`tr[data-line="${lineNo}"]`);
    expect(await wrongLine.locator("td").first().innerText()).toBe(lineNo);
    expect(await wrongLine.innerText()).toContain("into hauled, not yet sorted");
    expect(await page.getByTestId("ledger-count").innerText()).toBe("Showing 2 of 2 lines");

    await wrongLine.getByRole("button", { name: `Undo line ${lineNo}` }).click();
    const form = page.getByRole("form", { name: `Undo line ${lineNo}` });
    await form.getByText(`Undo the haul Test volunteer recorded`).waitFor();
    const confirm = form.getByRole("button", { name: "Undo this entry" });
    expect(await confirm.isDisabled()).toBe(true);
    await form.getByLabel("Reason").fill("Logged at the wrong bin");
    await confirm.click();

    const undo = page.locator("tr[data-line]", { hasText: `undo of line ${lineNo}` });
    await undo.waitFor({ timeout: 10_000 });
    expect(await undo.innerText()).toContain("Reason: Logged at the wrong bin");
    const undoNo = await undo.getAttribute("data-line");
    expect(await undo.locator("td").first().innerText()).toBe(undoNo);
    expect(await wrongLine.innerText()).toContain(`undone by line ${undoNo}`);
    expect(await wrongLine.getByRole("button", { name: /Undo line/ }).count()).toBe(0);
    await page.screenshot({ path: ".test-results/ledger-correct.png", fullPage: true });

    // The stock agrees: only the kept haul's estimate is still hauled.
    const stock = (await (await g.client("organiser")).json<{ stages: { hauled: number } }>("GET", `/api/drives/${g.driveId}/stock`)).body;
    expect(stock.stages.hauled).toBe(60);

    // Filters in the URL: pick a drop point, then Back returns to every line.
    await page.getByLabel("Drop point").selectOption(g.dropPointIds[0]);
    await page.waitForURL((u) => u.searchParams.get("dropPointId") === g.dropPointIds[0]);
    await expect.poll(() => lines.count()).toBe(1);
    await page.goBack();
    await page.waitForURL((u) => !u.searchParams.has("dropPointId"));
    await expect.poll(() => lines.count()).toBe(3);
    expect(await page.getByLabel("Drop point").inputValue()).toBe("");
    await page.goForward();
    await expect.poll(() => page.getByLabel("Drop point").inputValue()).toBe(g.dropPointIds[0]);
    await context.close();
  });

  it("a drive with more than 1,000 lines: 50 at a time, 'more than 1,000', Load more adds the next 50 without repeats", async () => {
    const g = await freshGroup("e2e-paging");
    const actorId = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
    // 1,050 one-can lines in three movements, through the ledger's own posting function.
    for (const [i, n] of [400, 400, 250].entries()) {
      const occurredAt = `2026-11-0${i + 2}T10:00:00.000Z`;
      const lines = Array.from({ length: n }, () => ({ from: null, to: "hauled", quantity: 1, dropPointId: g.dropPointIds[0], isEstimate: true, note: "" }));
      const p = { groupId: g.groupId, driveId: g.driveId, actorId, kind: "haul", occurredAt, day: occurredAt.slice(0, 10), details: {}, lines };
      await testDb().raw("select ledger_post(?::jsonb)", [JSON.stringify(p)]);
    }
    const { context, page } = await signedInPage(browser(), g.emails.organiser, { viewport: { width: 390, height: 844 } });
    await page.goto(`/ledger?driveId=${g.driveId}`);
    const lines = page.locator("tr[data-line]");
    await expect.poll(() => lines.count(), { timeout: 15_000 }).toBe(50);
    expect(await page.getByTestId("ledger-count").innerText()).toBe("Showing 50 of more than 1,000 lines");
    await page.getByRole("button", { name: "Load more" }).click();
    await expect.poll(() => lines.count(), { timeout: 10_000 }).toBe(100);
    expect(await page.getByTestId("ledger-count").innerText()).toBe("Showing 100 of more than 1,000 lines");
    // Four-digit line numbers stay on one line at 390 px (they broke as "100 / 9").
    const lineBoxes = await lines.first().locator("td").first().evaluate((td) => {
      const range = document.createRange();
      range.selectNodeContents(td);
      return range.getClientRects().length;
    });
    expect(lineBoxes).toBe(1);
    await page.getByTestId("ledger-count").scrollIntoViewIfNeeded();
    await page.screenshot({ path: ".test-results/ledger-paging-390.png" });
    const numbers = await lines.evaluateAll((rows) => rows.map((r) => Number(r.getAttribute("data-line"))));
    expect(new Set(numbers).size).toBe(100);
    // Newest first: the 250 of the 4th of November, highest line first.
    expect(numbers).toEqual([...numbers].sort((a, b) => b - a));
    // A filter that matches fewer than 1,000 gives the exact count again.
    await page.goto(`/ledger?driveId=${g.driveId}&from=2026-11-04&to=2026-11-04`);
    await expect.poll(() => page.getByTestId("ledger-count").innerText(), { timeout: 15_000 }).toBe("Showing 50 of 250 lines");
    await context.close();
  });
});
