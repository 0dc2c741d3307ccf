import { beforeAll, describe, expect, it } from "vitest";
import { APP_URL } from "@/tests/support/env";
import { newPage, PHONE, browserForFile } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { createOwnGroup, type OwnGroup } from "@/tests/support/own-group";

// Text people type is shown as text: a drive and a drop point named like
// markup appear literally on the public drive page and run nothing.
const DRIVE = `<script>window.__cantroveXss = "drive"</script>Cans & "Co" drive`;
const POINT = `<img src=x onerror="window.__cantroveXss='point'">Porch`;

let g: OwnGroup;
const browser = browserForFile();

beforeAll(async () => {
  g = await createOwnGroup(testDb(), "escaping", { drive: DRIVE, dropPoint: POINT });
});

describe("typed text is shown escaped", () => {
  it("the server-rendered HTML carries the names as escaped text", async () => {
    const html = await (await fetch(`${APP_URL}/drives/${g.driveSlug}`)).text();
    expect(html).not.toContain("<script>window.__cantroveXss");
    expect(html).not.toContain("<img src=x onerror");
    expect(html).toContain("&lt;script&gt;window.__cantroveXss");
  });

  it("in chromium the names read literally and no script of theirs runs", async () => {
    const { context, page } = await newPage(browser(), PHONE);
    try {
      await page.goto(`/drives/${g.driveSlug}`);
      await expect.poll(() => page.getByText(POINT, { exact: false }).count(), { timeout: 15_000 }).toBeGreaterThan(0);
      await expect(page.getByRole("heading", { level: 1 }).innerText()).resolves.toContain(`<script>window.__cantroveXss = "drive"</script>`);
      await page.waitForTimeout(300);
      expect(await page.evaluate(() => (window as unknown as { __cantroveXss?: string }).__cantroveXss)).toBeUndefined();
      expect(await page.locator('img[src="x"]').count()).toBe(0);
    } finally {
      await context.close();
    }
  });
});
