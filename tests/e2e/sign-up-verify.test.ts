import { randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
import { newPage, browserForFile } from "@/tests/support/browser";
import { APP_URL } from "@/tests/support/env";
import { waitForMail } from "@/tests/support/mail";

const browser = browserForFile();

describe("a new organiser signs up", () => {
  it("is told to check the mail, cannot sign in before opening the link, then lands home even when next= points away", async () => {
    const email = `founder-${randomBytes(3).toString("hex")}@signup.test`;
    const password = "a-founders-password";
    const { context, page } = await newPage(browser());

    await page.goto("/signup");
    await page.getByLabel("Your name").fill("Fern Founder");
    await page.getByLabel("E-mail").fill(email);
    await page.getByLabel("Password").fill(password);
    await page.getByLabel("Your group's name").fill("Quillon Lane Can Circle");
    await page.getByRole("button", { name: "Create group" }).click();
    await expect.poll(() => page.getByText("Check your e-mail").count()).toBe(1);
    expect(new URL(page.url()).pathname).toBe("/signup");

    const signIn = async (path: string) => {
      await page.goto(path);
      await page.getByLabel("E-mail").fill(email);
      await page.getByLabel("Password").fill(password);
      await page.getByRole("button", { name: "Sign in" }).click();
    };
    await signIn("/signin");
    await expect.poll(() => page.getByText(/Open the link we e-mailed/).count()).toBe(1);
    await page.getByRole("button", { name: "Send the link again" }).click();
    await expect.poll(() => page.getByText(/a new link is on its way/).count()).toBe(1);

    const mail = await waitForMail(email, (m) => m.headers["x-cantrove-kind"] === "email_verification");
    const link = mail.text.match(/https?:\/\/\S+\/verify\/[A-Za-z0-9_-]+/)?.[0];
    expect(link).toBeTruthy();
    await page.goto(link!);
    await expect.poll(() => page.getByText("Your address is confirmed").count()).toBe(1);

    // `/\host` is read by browsers as another host: the form must go home instead.
    await signIn(`/signin?next=${encodeURIComponent("/\\evil.example/")}`);
    await page.waitForURL((url) => !url.pathname.startsWith("/signin"), { timeout: 15_000 });
    expect(new URL(page.url()).origin).toBe(new URL(APP_URL).origin);
    expect(new URL(page.url()).pathname).toBe("/dashboard");
    await context.close();
  });
});
