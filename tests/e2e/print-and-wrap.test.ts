import path from "node:path";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { launchBrowser, newPage, PHONE, signInAs } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { APP_URL } from "@/tests/support/env";
import { ApiClient } from "@/tests/support/http";
import { createOwnGroup, type OwnGroup } from "@/tests/support/own-group";
import { pdfPages } from "@/tests/support/pdf-text";

// What goes on a wall: the bin sign (one sheet, its QR code opening that bin's
// own page) and the build sheet (at most two pages); and long unbroken text
// typed by donors never widening the organiser's page.
const shots = path.resolve(import.meta.dirname, "../../.test-results");
let browser: Browser;
let g: OwnGroup;
// 120 characters, the longest drop-point name the form takes, with no space to break at.
const LONG_NAME = "Q".repeat(120);

beforeAll(async () => {
  browser = await launchBrowser();
  g = await createOwnGroup(testDb(), "print", { dropPoint: LONG_NAME });
});
afterAll(async () => browser?.close());

describe("the bin sign", () => {
  it("fills one A4 or Letter sheet, and its QR code encodes this bin's page, which takes a one-tap report", async () => {
    // Twice the pixels, as a phone camera would see the printed code more sharply than one screen pixel per dot.
    const { context, page } = await newPage(browser, { deviceScaleFactor: 2 });
    try {
      for (const paper of ["a4", "letter"] as const) {
        await page.goto(`/drives/${g.driveSlug}/sign/${g.dropPointId}?paper=${paper}`);
        await page.emulateMedia({ media: "print" });
        // preferCSSPageSize: the sign's own @page rule chooses the paper.
        const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true, path: path.join(shots, `sign-${paper}.pdf`) });
        const pages = await pdfPages(new Uint8Array(pdf));
        expect(pages).toHaveLength(1);
        expect(pages[0]).toContain("Empty cans here, please");
        expect(pages[0]).toContain("gloves");
        await page.emulateMedia({ media: "screen" });
      }
      // Decode the QR code as a phone would: a screenshot read by jsQR, a general-purpose QR reader.
      const shot = await page.locator("[data-qr-text]").screenshot({ scale: "device" });
      const png = PNG.sync.read(shot);
      const code = jsQR(new Uint8ClampedArray(png.data.buffer, png.data.byteOffset, png.data.length), png.width, png.height);
      expect(code?.data).toBe(`${APP_URL}/drives/${g.driveSlug}/bins/${g.dropPointId}`);

      // The bin page it opens: "it is full" is one tap, stored through the public fill-report action.
      await page.goto(new URL(code!.data).pathname);
      await page.getByRole("heading", { name: "Is this bin full?" }).waitFor();
      await page.getByRole("button", { name: /^It is full/ }).click();
      await page.getByText("Thank you — the organisers can see your report").waitFor();
      const level = await testDb()("fill_reports").where({ drop_point_id: g.dropPointId }).orderBy("created_at", "desc").first();
      expect(level?.level).toBe(100);
    } finally {
      await context.close();
    }
  });
});

describe("the build sheet", () => {
  it("prints on at most two pages, with the dimensioned grid, the materials and the live counts on page 1", async () => {
    const { context, page } = await newPage(browser);
    try {
      await signInAs(page, g.emails.builder);
      await page.goto(`/units/${g.heaterId}/sheet`);
      await page.getByRole("heading", { name: /^Build sheet:/ }).waitFor();
      const pdf = await page.pdf({ format: "A4", printBackground: true, path: path.join(shots, "build-sheet-a4.pdf") });
      const pages = await pdfPages(new Uint8Array(pdf));
      expect(pages.length).toBeLessThanOrEqual(2);
      const first = pages[0].replace(/\s+/g, " ");
      expect(first).toContain("Materials");
      expect(first).toContain("Still needed");
      // 13 columns × 14 rows of 66 mm × 122 mm cans (the fixture's unit): 858 mm across, 1708 mm up.
      expect(first).toContain("13 × 66 mm = 858 mm");
      expect(first).toContain("14 × 122 mm = 1,708 mm");
      const letter = await page.pdf({ format: "Letter", printBackground: true, path: path.join(shots, "build-sheet-letter.pdf") });
      const letterPages = await pdfPages(new Uint8Array(letter));
      expect(letterPages.length).toBeLessThanOrEqual(2);
      expect(letterPages[0]).toContain("Materials");
    } finally {
      await context.close();
    }
  });
});

describe("long unbroken text", () => {
  it("keeps the organiser's drive page at the phone's width with a 300-character bin note and long names", async () => {
    const api = new ApiClient();
    const note = "W".repeat(300);
    const report = await api.json("POST", `/api/public/drives/${g.driveSlug}/drop-points/${g.dropPointId}/fill-reports`, { level: 50, note });
    expect(report.status).toBe(201);
    const pledge = await api.json("POST", `/api/public/drives/${g.driveSlug}/pledges`, { dropPointId: g.dropPointId, name: "N".repeat(120), bags: 2, bringOn: "2026-12-20" });
    expect(pledge.status).toBe(201);
    const { context, page } = await newPage(browser, PHONE);
    try {
      await signInAs(page, g.emails.organiser);
      await page.goto(`/organise/drives/${g.driveId}`);
      await page.getByText(note.slice(0, 40), { exact: false }).first().waitFor();
      const [scroll, inner] = await page.evaluate(() => [document.documentElement.scrollWidth, window.innerWidth]);
      await page.screenshot({ path: path.join(shots, "organise-drive-long-text.png"), fullPage: true });
      expect(scroll).toBeLessThanOrEqual(inner);
      // And the public pages the same donor sees.
      for (const url of [`/drives/${g.driveSlug}`, `/drives/${g.driveSlug}/bins/${g.dropPointId}`]) {
        await page.goto(url);
        const [s, w] = await page.evaluate(() => [document.documentElement.scrollWidth, window.innerWidth]);
        expect(s, url).toBeLessThanOrEqual(w);
      }
    } finally {
      await context.close();
    }
  });
});
