import { beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { newPage, signInAs, browserForFile } from "@/tests/support/browser";
import { DEMO } from "@/tests/support/env";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { testDb } from "@/tests/support/db";
import { pdfText } from "@/tests/support/pdf-text";

// A builder's journey: plan a unit from a 30 × 60 in sheet, save it to the
// demo drive, see the drive's target grow, claim cans, record part of the
// build, be refused a claim past the unit's need, print the build sheet, and
// put the unit on the wall, which gives its unbuilt claims back.
const browser = browserForFile();
let page: Page;
const f = demoFixtureForFile();

beforeAll(async () => {
  ({ page } = await newPage(browser()));
});

/** Page object for the drive's line on /units: "Target X cans: Y for N heaters + S spare". */
async function driveTarget(): Promise<{ cans: number; heaterCans: number; heaters: number }> {
  await page.goto("/units");
  // Inside #main only: while the page streams in, React briefly keeps a hidden copy outside it.
  const text = await page.locator("#main").getByTestId(`drive-target-${f.demoDriveSlug}`).innerText();
  const m = /Target ([\d,]+) cans: ([\d,]+) for (\d+) heaters?/.exec(text);
  if (!m) throw new Error(`unexpected target line: ${text}`);
  const n = (s: string) => Number(s.replace(/,/g, ""));
  return { cans: n(m[1]), heaterCans: n(m[2]), heaters: n(m[3]) };
}

/** The drive's unclaimed cans as the unit page states them. */
async function driveUnclaimed(): Promise<number> {
  const text = await page.locator("#main").getByTestId("drive-unclaimed").innerText();
  const m = /The drive has ([\d,]+) finished/.exec(text);
  if (!m) throw new Error(`unexpected stock line: ${text}`);
  return Number(m[1].replace(/,/g, ""));
}

async function unitLines(unitUrl: string): Promise<number> {
  const row = await testDb()("ledger_lines").where({ heater_unit_id: unitUrl.split("/").pop() }).count({ n: "*" }).first();
  return Number(row?.n);
}

const figure = (id: string) => page.locator(`[data-figure="${id}"]`).first().innerText();

describe("a builder plans, saves, claims, builds and prints a heater unit", () => {
  it("works end to end", async () => {
    await signInAs(page, DEMO.builder);
    const before = await driveTarget();

    await page.goto("/plan");
    // Signed in, the planner keeps the group's navigation, not the visitor's header.
    await expect(page.getByRole("navigation", { name: "Group" }).getByRole("link", { name: "My units" }).count()).resolves.toBe(1);
    await expect(page.getByRole("link", { name: "Sign in", exact: true }).count()).resolves.toBe(0);
    await page.locator("#sheet-1-width").fill("30");
    await page.locator("#sheet-1-height").fill("60");
    // Common practice, no published source: 11 × 12 = 132 cans and 528 holes.
    expect(await figure("cans")).toBe("132");
    expect(await figure("holes")).toBe("528");
    const name = `Journey unit ${Date.now()}`;
    await page.getByLabel("Unit name").fill(name);
    await page.getByLabel("Count it against the drive").selectOption({ value: f.demoDriveId });
    await page.getByRole("button", { name: "Save as a heater unit" }).click();
    await page.waitForURL(/\/units\/[0-9a-f-]{36}$/, { timeout: 20_000 });
    const unitUrl = new URL(page.url()).pathname;
    await page.getByRole("heading", { name }).waitFor();

    // Target = Σ unit cans + ⌈5 %⌉ spare (PRODUCT.md computation 2).
    const after = await driveTarget();
    expect(after.heaterCans).toBe(before.heaterCans + 132);
    expect(after.heaters).toBe(before.heaters + 1);
    expect(after.cans).toBe(after.heaterCans + Math.ceil(after.heaterCans * 0.05));
    const covered = await page.locator("#main").getByTestId(`drive-covered-${f.demoDriveSlug}`).innerText();
    expect(covered).toMatch(new RegExp(`^Good cans for \\d+ of ${after.heaters} heaters \\([\\d,]+ counted\\)\\.$`));

    // Claim the unit's cans, then record one column (12 cans) built in.
    await page.goto(unitUrl);
    await page.getByLabel("Claim cans").fill("132");
    await page.getByRole("button", { name: "Claim", exact: true }).click();
    await page.getByRole("status").filter({ hasText: "Claim: 132 cans recorded" }).waitFor();
    await page.waitForFunction(() => document.querySelector('[data-figure="claimed"]')?.textContent === "132");
    await page.getByLabel("Record cans built in").fill("12");
    await page.getByRole("button", { name: "Record built in" }).click();
    await page.waitForFunction(() => document.querySelector('[data-figure="built-in"]')?.textContent === "12 of 132");
    expect(await figure("claimed")).toBe("120");
    // The figures are live (react-query); the state badge follows with the page's refresh.
    await page.waitForFunction(() => document.querySelector("[data-state]")?.getAttribute("data-state") === "building");

    // Past its need: 132 cans + ⌈132 × 5 %⌉ = 139 (PRODUCT.md's spare rule), 132 claimed or built in, 7 left.
    expect(await figure("need")).toBe("139");
    expect(await figure("still-needed")).toBe("7");
    const refusal = "This unit needs only 7 more cans (its 132 cans plus 7 spare). Claim 7 or fewer.";
    const linesBefore = await unitLines(unitUrl);
    await page.getByLabel("Claim cans").fill("8");
    await page.getByRole("button", { name: "Claim", exact: true }).click();
    await page.getByRole("alert").filter({ hasText: refusal }).waitFor();
    // The form refused before sending; the server says the very same.
    expect(await unitLines(unitUrl)).toBe(linesBefore);
    const server = await page.evaluate(async (url) => {
      const res = await fetch(`/api/heaters/${url.split("/").pop()}/claims`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ quantity: 8 }) });
      return { status: res.status, body: await res.json() };
    }, unitUrl);
    expect(server).toEqual({ status: 409, body: { error: { code: "conflict", message: refusal, remaining: 7 } } });

    // The build sheet, printed to PDF by the browser.
    await page.goto(`${unitUrl}/sheet`);
    await page.getByRole("heading", { name: `Build sheet: ${name}` }).waitFor();
    // Inside #main: while the page streams in, React briefly keeps a hidden copy outside it.
    const screenText = await page.locator("#main").locator("main").innerText();
    expect(screenText).toContain("528");
    const sheetCans = page.locator("#main").getByTestId("sheet-cans");
    expect(await sheetCans.locator('[data-figure="claimed"]').innerText()).toBe("120");
    expect(await sheetCans.locator('[data-figure="built-in"]').innerText()).toBe("12 of 132");
    expect(await sheetCans.locator('[data-figure="still-needed"]').innerText()).toBe("7");
    const pdf = await page.pdf({ format: "A4", printBackground: true });
    expect(Buffer.from(pdf.subarray(0, 5)).toString()).toBe("%PDF-");
    const text = (await pdfText(new Uint8Array(pdf))).replace(/\s+/g, " ");
    expect(text).toContain(`Build sheet: ${name}`);
    for (const count of ["132", "528", "11", "12"]) expect(text).toContain(count);
    expect(text).toContain("Still needed 7");
    expect(text).toContain("Punch 4 holes in each can bottom — 528 holes in all");
    expect(text).not.toContain("Print this sheet");
    for (const caution of [
      "gloves",
      "eye protection and hearing protection",
      "well-ventilated",
      "high-temperature matt black paint",
      "over-temperature switch",
      "backdraft damper",
      "licensed electrician",
      "local building code",
    ]) {
      expect(text).toContain(caution);
    }

    // On the wall: the 120 claimed cans not built in go back to the drive, on screen too.
    await page.goto(unitUrl);
    const unclaimedBefore = await driveUnclaimed();
    await page.getByRole("button", { name: "Mark “On the wall”" }).click();
    await page.getByRole("status").filter({ hasText: "120 claimed cans not built in went back to the drive." }).waitFor();
    await page.waitForFunction(() => document.querySelector('[data-figure="claimed"]')?.textContent === "0");
    expect(await figure("built-in")).toBe("12 of 132");
    await page.waitForFunction(() => document.querySelector('[data-state]')?.getAttribute("data-state") === "installed");
    expect(await driveUnclaimed()).toBe(unclaimedBefore + 120);
  });
});
