import { beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { newPage, browserForFile } from "@/tests/support/browser";
import { ApiClient } from "@/tests/support/http";
import { areaToM2, formatAperture, formatLength, formatNumber, formatPercent } from "@/lib/heaters/format";
import { clearDayEnergy } from "@/lib/heaters/sun";

// The planner page computes in the browser; it must show exactly what the API
// answers for the same input. No account needed.
const browser = browserForFile();
let page: Page;
const api = new ApiClient();

type Grid = { columns: number; rows: number; cans: number; holes: number; slack: { width: number; height: number }; apertureArea: number; unit: "mm" | "in" };

beforeAll(async () => {
  ({ page } = await newPage(browser()));
});

const figure = (id: string) => page.locator(`[data-figure="${id}"]`).first().innerText();

async function expectGridMatches(body: Record<string, unknown>) {
  const res = await api.json<Grid>("POST", "/api/plan/can-grid", body);
  expect(res.status).toBe(200);
  const g = res.body;
  expect(await figure("columns")).toBe(formatNumber(g.columns));
  expect(await figure("rows")).toBe(formatNumber(g.rows));
  expect(await figure("cans")).toBe(formatNumber(g.cans));
  expect(await figure("holes")).toBe(formatNumber(g.holes));
  expect(await figure("slack-width")).toBe(formatLength(g.slack.width, g.unit));
  expect(await figure("slack-height")).toBe(formatLength(g.slack.height, g.unit));
  expect(await figure("aperture")).toBe(formatAperture(g.apertureArea, g.unit));
  return g;
}

describe("/plan shows the API's numbers", () => {
  it("for a 30 × 60 in chamber sheet, in inches and in millimetres, and for the heat estimate", async () => {
    await page.goto("/plan");
    await expect(page.getByRole("heading", { name: "Heater planner" }).isVisible()).resolves.toBe(true);
    await page.locator("#sheet-1-width").fill("30");
    await page.locator("#sheet-1-height").fill("60");
    // Common practice, no published source: 11 × 12 = 132 cans, 528 holes.
    const inches = await expectGridMatches({ glazingWidth: 30, glazingHeight: 60, unit: "in", coverage: "chamber" });
    expect(inches.cans).toBe(132);
    expect(await figure("cans")).toBe("132");
    expect(await figure("holes")).toBe("528");

    // The second sheet carries its own settings: it covers the chamber and both 5 in manifolds,
    // side by side with the first, which covers the chamber only.
    await page.locator("#sheet-2-coverage-full").check();
    await page.locator("#sheet-2-manifold").fill("5");
    await page.locator("#sheet-2-width").fill("28");
    await page.locator("#sheet-2-height").fill("74");
    await page.getByRole("radio", { name: "Plan with this" }).nth(1).check();
    const full = await expectGridMatches({ glazingWidth: 28, glazingHeight: 74, unit: "in", coverage: "full", manifoldHeight: 5 });
    expect(full.cans).toBe(130);
    expect(await page.locator("#sheet-1-coverage-chamber").isChecked()).toBe(true);
    const cells = await page.locator('[data-cell="covers"]').allInnerTexts();
    expect(cells).toEqual(["Chamber only", "Chamber and manifolds"]);
    // A no-break space joins a number and its unit (lib/format).
    expect(await page.locator('[data-cell="manifolds"]').nth(1).innerText()).toBe("5\u00a0in each, inside the sheet");

    // The headline heat uses the clear-day peak sunlight on the chosen wall and day, as computed
    // by lib/heaters/sun (the same function the page runs); 800 W/m² is shown apart as a rating-style figure.
    await page.locator("#sun-lat").fill("45");
    await page.locator("#sun-bearing").selectOption("180");
    await page.locator("#sun-date").fill("2026-12-21");
    const peak = clearDayEnergy({ latitude: 45, date: new Date("2026-12-21"), facingBearing: 180 }).peakWm2;
    expect(await figure("day-peak")).toBe(`${formatNumber(peak)} W/m²`);
    expect(peak).toBeGreaterThan(0);
    expect(Math.abs(peak - 800)).toBeGreaterThan(10); // the headline is not the fixed figure
    const aperture = areaToM2(full.apertureArea, "in");
    const coefficients = { eta0: 0.7, a1: 5, inletC: 18, ambientC: 5, airflowM3h: 170 };
    for (const [prefix, irradianceWm2] of [["", peak], ["rating-", 800]] as const) {
      const heat = await api.json<{ efficiency: number; usefulW: number; usefulBtuh: number; airRiseC: number; outletC: number }>(
        "POST",
        "/api/plan/heat-output",
        { apertureAreaM2: aperture, irradianceWm2, ...coefficients },
      );
      expect(await figure(`${prefix}efficiency`)).toBe(formatPercent(heat.body.efficiency));
      expect(await figure(`${prefix}useful`)).toBe(`${formatNumber(heat.body.usefulW)} W · ${formatNumber(heat.body.usefulBtuh)} BTU/h`);
      expect(await figure(`${prefix}rise`)).toBe(`${formatNumber(heat.body.airRiseC, 1)} °C`);
      expect(await figure(`${prefix}outlet`)).toBe(`${formatNumber(heat.body.outletC, 1)} °C`);
    }
    await page.getByRole("heading", { name: /Rating-style figure at a fixed 800 W\/m²/ }).waitFor();

    // Switch to millimetres: typed values (the second sheet's manifolds too) convert, and the grid still matches the API in mm.
    await page.getByRole("radio", { name: "Plan with this" }).first().check();
    await page.getByLabel("Millimetres").check();
    expect(await page.locator("#sheet-2-manifold").inputValue()).toBe("127");
    expect(await page.locator("#sheet-1-width").inputValue()).toBe("762");
    expect(await page.locator("#sheet-1-height").inputValue()).toBe("1524");
    const mm = await expectGridMatches({ glazingWidth: 762, glazingHeight: 1524, unit: "mm", coverage: "chamber", manifoldHeight: 127 });
    expect(mm.cans).toBe(132);
  });

  it("keeps what was typed and says what to fix on a bad value", async () => {
    await page.goto("/plan");
    await page.locator("#sheet-1-width").fill("-3");
    const error = page.locator("#sheet-1-width-error");
    await expect(error.innerText()).resolves.toMatch(/greater than 0/);
    expect(await page.locator("#sheet-1-width").inputValue()).toBe("-3");
    const api422 = await api.json<{ error: { fields: Record<string, string> } }>("POST", "/api/plan/can-grid", {
      glazingWidth: -3,
      glazingHeight: 60,
      unit: "in",
      coverage: "chamber",
    });
    expect(api422.status).toBe(422);
    expect(await error.innerText()).toBe(api422.body.error.fields.glazingWidth);
  });

  it("says plainly when a sheet is too narrow for one column of cans, where the API answers 0 cans", async () => {
    await page.goto("/plan");
    await page.locator("#sheet-1-width").fill("2");
    await page.locator("#sheet-1-height").fill("60");
    const res = await api.json<Grid>("POST", "/api/plan/can-grid", { glazingWidth: 2, glazingHeight: 60, unit: "in", coverage: "chamber" });
    expect(res.body.columns).toBe(0);
    expect(res.body.cans).toBe(0);
    // A 355 mL can is about 66 mm across (the planner's default; common practice, no published source):
    // 66 / 25.4 = 2.598 in (NIST SP 811 inch), more than the 2 in sheet.
    const message = await page.getByTestId("fit-problem").first().innerText();
    expect(message).toContain("Too narrow for one column of cans");
    // 66 mm = 2.598 in, to the nearest eighth as a tape measure reads it: 2⅝ in.
    expect(message).toContain("2⅝\u00a0in across");
    expect(await page.getByTestId("grid-fit-problem").first().innerText()).toBe(message);
    expect(await figure("cans")).toBe("0");
  });
});
