import { beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { newPage, browserForFile } from "@/tests/support/browser";
import { ApiClient } from "@/tests/support/http";
import { areaToM2, formatArea, formatLength, formatM2, formatNumber, formatPercent } from "@/lib/heaters/format";

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
  expect(await figure("aperture")).toBe(`${formatArea(g.apertureArea, g.unit)} (${formatM2(areaToM2(g.apertureArea, g.unit))})`);
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

    // Full coverage with 5 in manifolds on the second sheet, chosen for planning.
    await page.getByLabel("Chamber and both manifolds").check();
    await page.locator("#plan-manifoldHeight").fill("5");
    await page.locator("#sheet-2-width").fill("28");
    await page.locator("#sheet-2-height").fill("74");
    await page.getByRole("radio", { name: "Plan with this" }).nth(1).check();
    const full = await expectGridMatches({ glazingWidth: 28, glazingHeight: 74, unit: "in", coverage: "full", manifoldHeight: 5 });
    expect(full.cans).toBe(130);

    // The heat estimate for that aperture, against /api/plan/heat-output.
    const heat = await api.json<{ efficiency: number; usefulW: number; usefulBtuh: number; airRiseC: number; outletC: number }>(
      "POST",
      "/api/plan/heat-output",
      { apertureAreaM2: areaToM2(full.apertureArea, "in"), irradianceWm2: 800, eta0: 0.7, a1: 5, inletC: 18, ambientC: 5, airflowM3h: 170 },
    );
    expect(await figure("efficiency")).toBe(formatPercent(heat.body.efficiency));
    expect(await figure("useful")).toBe(`${formatNumber(heat.body.usefulW)} W · ${formatNumber(heat.body.usefulBtuh)} BTU/h`);
    expect(await figure("rise")).toBe(`${formatNumber(heat.body.airRiseC, 1)} °C`);
    expect(await figure("outlet")).toBe(`${formatNumber(heat.body.outletC, 1)} °C`);

    // Switch to millimetres: typed values convert, and the grid still matches the API in mm.
    await page.getByLabel("Only the can chamber", { exact: false }).check();
    await page.getByRole("radio", { name: "Plan with this" }).first().check();
    await page.getByLabel("Millimetres").check();
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
});
