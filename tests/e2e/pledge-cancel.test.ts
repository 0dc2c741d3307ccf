import { beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import type { Page } from "playwright-core";
import { newPage, browserForFile } from "@/tests/support/browser";
import { demoFixtureForFile } from "@/tests/support/fixtures";
import { testDb } from "@/tests/support/db";
import { ApiClient } from "@/tests/support/http";
import { waitForMail } from "@/tests/support/mail";

// Issue 16: a donor cancels a pledge from the link in the confirmation mail,
// with no account. Opening the link asks first; the button's POST cancels.
const browser = browserForFile();
let page: Page;
const f = demoFixtureForFile();

beforeAll(async () => {
  ({ page } = await newPage(browser()));
});

describe("a donor cancels a pledge from the e-mail", () => {
  it("opens the link, confirms, and the pledge is cancelled", async () => {
    const email = `donor-${randomUUID().slice(0, 8)}@example.test`;
    const made = await new ApiClient().json<{ id: string }>("POST", `/api/public/drives/${f.demoDriveSlug}/pledges`, {
      dropPointId: f.demoDropPointId,
      name: "Ida Fenwick",
      email,
      bags: 2,
      bringOn: "2026-12-19",
    });
    expect(made.status).toBe(201);
    const mail = await waitForMail(email, (m) => m.subject.startsWith("Your pledge"));
    const path = /https?:\/\/[^/\s]+(\/pledges\/cancel\/[A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
    expect(path, mail.text).toBeTruthy();

    await page.goto(path!);
    await page.getByText("Cancel it, so the organisers do not wait for your bags?").waitFor();
    // Opening the page changed nothing.
    expect((await testDb()("pledges").where({ id: made.body.id }).first("status")).status).toBe("pledged");
    await page.getByRole("button", { name: "Yes, cancel my pledge" }).click();
    await page.getByText("Your pledge is cancelled").waitFor();
    expect((await testDb()("pledges").where({ id: made.body.id }).first("status")).status).toBe("cancelled");

    await page.reload();
    await page.getByText("This pledge is: Cancelled by the donor.").waitFor();
  });
});
