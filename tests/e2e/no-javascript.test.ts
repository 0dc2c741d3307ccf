import { randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
import { newPage, PHONE, browserForFile } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";

// The browser forms are server actions in plain <form>s: with JavaScript off
// (or before it arrives) they post and the page comes back with the answer.
const PAGE = "/drives/larkhollow-winter-2026";

const browser = browserForFile();

describe("forms with JavaScript disabled", () => {
  it("a donor pledges on the public drive page: a refusal keeps what was typed, the pledge is stored and confirmed", async () => {
    const { context, page } = await newPage(browser(), { ...PHONE, javaScriptEnabled: false });
    try {
      const donor = `nojs-${randomBytes(3).toString("hex")}@example.test`;
      await page.goto(PAGE);
      const point = page.getByLabel("Drop point", { exact: true });
      await point.selectOption({ index: 1 });
      const pointId = await point.inputValue();
      await page.getByLabel("About how many bags").fill("two");
      await page.getByLabel("When you will bring them").fill("2026-12-11");
      await page.getByLabel("Your name (optional)").fill("Nell Nojs");
      await page.getByLabel("E-mail for a confirmation (optional)").fill(donor);
      await page.getByRole("button", { name: "Send my pledge" }).click();

      // The page came back from the server with the refusal beside the box and everything else as typed.
      await page.getByText("Enter a whole number of bags, like 3.").waitFor();
      await expect(page.getByLabel("About how many bags").getAttribute("aria-invalid")).resolves.toBe("true");
      await expect(page.getByLabel("About how many bags").inputValue()).resolves.toBe("two");
      await expect(page.getByLabel("Drop point", { exact: true }).inputValue()).resolves.toBe(pointId);
      await expect(page.getByLabel("E-mail for a confirmation (optional)").inputValue()).resolves.toBe(donor);
      await expect(page.getByLabel("Your name (optional)").inputValue()).resolves.toBe("Nell Nojs");
      expect(Number((await testDb()("pledges").where({ email: donor }).count("* as n").first())?.n)).toBe(0);

      await page.getByLabel("About how many bags").fill("3");
      await page.getByRole("button", { name: "Send my pledge" }).click();
      await page.getByText("Thank you — your pledge is in.").waitFor();
      await page.getByText(`We sent a confirmation to ${donor}.`).waitFor();
      const rows = await testDb()("pledges").where({ email: donor }).select("bags", "drop_point_id", "name");
      expect(rows).toEqual([{ bags: 3, drop_point_id: pointId, name: "Nell Nojs" }]);
    } finally {
      await context.close();
    }
  });

  it("someone at a bin says it is full: the native disclosure opens, the report is stored", async () => {
    const { context, page } = await newPage(browser(), { ...PHONE, javaScriptEnabled: false });
    try {
      const note = `nojs-note-${randomBytes(3).toString("hex")}`;
      await page.goto(PAGE);
      const item = page.getByTestId("drop-point").first();
      await item.locator("summary").click();
      await item.getByRole("button", { name: "Send report" }).click();
      await item.getByText("Choose how full the bin is.").waitFor();
      // The page that came back keeps this point's form open, with the message beside the choices.
      const again = page.getByTestId("drop-point").first();
      await expect(again.locator("details").getAttribute("open")).resolves.not.toBeNull();
      await again.getByLabel("Full — no room left").check();
      await again.getByLabel("Anything else? (optional)").fill(note);
      await again.getByRole("button", { name: "Send report" }).click();
      await page.getByText("Thanks — the organisers can see your report.").waitFor();
      const rows = await testDb()("fill_reports").where({ note }).select("level");
      expect(rows).toEqual([{ level: 100 }]);
    } finally {
      await context.close();
    }
  });

  it("a donor follows a drop point's “Pledge cans here” link: the form opens on that point, and the pledge goes to it", async () => {
    const { context, page } = await newPage(browser(), { ...PHONE, javaScriptEnabled: false });
    try {
      const donor = `nojs-here-${randomBytes(3).toString("hex")}@example.test`;
      await page.goto(PAGE);
      const item = page.getByTestId("drop-point").nth(2);
      const pointId = (await item.getAttribute("id"))!.replace(/^point-/, "");
      // Directions in the visitor's own map app, with no tracking parameters.
      const osm = new URL((await item.getByRole("link", { name: "Open in OpenStreetMap" }).getAttribute("href"))!);
      expect([...osm.searchParams.keys()]).toEqual(["mlat", "mlon"]);
      expect(await item.getByRole("link", { name: "Directions (map app)" }).getAttribute("href")).toMatch(/^geo:-?\d+(\.\d+)?,-?\d+(\.\d+)?$/);
      await item.getByRole("link", { name: "Pledge cans here" }).click();
      await page.waitForURL((url) => url.searchParams.get("point") === pointId && url.hash === "#pledge");
      await expect(page.getByLabel("Drop point", { exact: true }).inputValue()).resolves.toBe(pointId);
      await page.getByLabel("About how many bags").fill("2");
      await page.getByLabel("When you will bring them").fill("2026-12-12");
      await page.getByLabel("E-mail for a confirmation (optional)").fill(donor);
      await page.getByRole("button", { name: "Send my pledge" }).click();
      await page.getByText("Thank you — your pledge is in.").waitFor();
      const rows = await testDb()("pledges").where({ email: donor }).select("drop_point_id");
      expect(rows).toEqual([{ drop_point_id: pointId }]);
    } finally {
      await context.close();
    }
  });

  it("on a bin's own page, “it is full” is one tap", async () => {
    const { context, page } = await newPage(browser(), { ...PHONE, javaScriptEnabled: false });
    try {
      await page.goto(PAGE);
      const item = page.getByTestId("drop-point").first();
      const pointId = (await item.getAttribute("id"))!.replace(/^point-/, "");
      await item.getByRole("link", { name: "This bin’s page" }).click();
      await page.waitForURL(`**${PAGE}/bins/${pointId}`);
      const before = new Date();
      await page.getByRole("button", { name: /^It is full/ }).click();
      await page.getByText("Thank you — the organisers can see your report").waitFor();
      const rows = await testDb()("fill_reports").where({ drop_point_id: pointId }).where("created_at", ">=", new Date(before.getTime() - 5_000)).select("level");
      expect(rows.map((r) => r.level)).toContain(100);
    } finally {
      await context.close();
    }
  });

  it("a new organiser signs up: a refused password keeps the rest, then the check-your-mail answer shows", async () => {
    const { context, page } = await newPage(browser(), { javaScriptEnabled: false });
    try {
      const email = `nojs-founder-${randomBytes(3).toString("hex")}@signup.test`;
      await page.goto("/signup");
      await page.getByLabel("Your name").fill("Orla Offline");
      await page.getByLabel("E-mail").fill(email);
      await page.getByLabel("Password").fill("short");
      await page.getByLabel("Your group's name").fill("Quillon Lane Quiet Circle");
      await page.getByRole("button", { name: "Create group" }).click();
      await expect(page.getByLabel("Password").getAttribute("aria-invalid")).resolves.toBe("true");
      // The password is never sent back into the page; the rest is as typed.
      await expect(page.getByLabel("Password").inputValue()).resolves.toBe("");
      await expect(page.getByLabel("E-mail").inputValue()).resolves.toBe(email);
      await expect(page.getByLabel("Your group's name").inputValue()).resolves.toBe("Quillon Lane Quiet Circle");
      await page.getByLabel("Password").fill("a-long-enough-password");
      await page.getByRole("button", { name: "Create group" }).click();
      await page.getByText("Check your e-mail").waitFor();
      await page.getByText(email).waitFor();
      expect(new URL(page.url()).pathname).toBe("/signup");
      const user = await testDb()("users").where({ email }).first();
      expect(user?.name).toBe("Orla Offline");
    } finally {
      await context.close();
    }
  });
});
