import { randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
import { PHONE, newPage, signInAs, browserForFile } from "@/tests/support/browser";
import { DEMO } from "@/tests/support/env";
import { waitForMail } from "@/tests/support/mail";
import { invitationPage, membersPage } from "./pages/accounts";

const browser = browserForFile();

describe("an organiser invites a volunteer", () => {
  it("the invitation arrives, the volunteer joins, lands on their home and is refused organiser pages", async () => {
    const email = `new-volunteer-${randomBytes(3).toString("hex")}@invitee.test`;
    const password = "a-volunteer-password";
    const errors: string[] = [];

    // The organiser, on a laptop.
    const organiser = await newPage(browser());
    organiser.page.on("console", (m) => m.type() === "error" && errors.push(m.text()));
    await signInAs(organiser.page, DEMO.organiser);
    expect(new URL(organiser.page.url()).pathname).toBe("/dashboard");
    await membersPage.open(organiser.page);
    await membersPage.invite(organiser.page, email, "volunteer");
    await expect.poll(() => membersPage.openInvitations(organiser.page).getByText(email).count()).toBe(1);

    // The e-mail, caught by the SMTP fake.
    const mail = await waitForMail(email, (m) => /invited you/.test(m.text));
    expect(mail.subject).toMatch(/Larkhollow Warm Rooms Circle/);
    const link = mail.text.match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/)?.[0];
    expect(link).toBeTruthy();

    // The volunteer, on a phone, follows the link and chooses a password.
    const volunteer = await newPage(browser(), PHONE);
    volunteer.page.on("console", (m) => m.type() === "error" && errors.push(m.text()));
    await invitationPage.accept(volunteer.page, new URL(link!).pathname, "Rowan Newcomer", password);
    await expect.poll(() => volunteer.page.getByLabel("E-mail").inputValue()).toBe(email);
    await signInAs(volunteer.page, email, password);
    expect(new URL(volunteer.page.url()).pathname).toBe("/log");
    await volunteer.page.getByRole("heading", { name: "Hello, Rowan" }).waitFor();

    // Organiser pages: sent elsewhere, never shown.
    for (const path of ["/dashboard", "/members", "/mail"]) {
      const res = await volunteer.page.goto(path);
      await volunteer.page.waitForURL((url) => url.pathname === "/forbidden");
      expect(res?.url()).toContain("/forbidden");
      await volunteer.page.getByRole("heading", { name: "Not open to your role" }).waitFor();
    }
    const api = await volunteer.page.request.get("/api/members");
    expect(api.status()).toBe(403);

    // The used link no longer works.
    await volunteer.page.goto(new URL(link!).pathname);
    await volunteer.page.getByText("This invitation link does not work any more").waitFor();

    // Back on the organiser's page the invitation has left the open list.
    await membersPage.open(organiser.page);
    await organiser.page.getByRole("list", { name: "Members" }).getByText("Rowan Newcomer", { exact: true }).waitFor();
    expect(await membersPage.openInvitations(organiser.page).getByText(email).count()).toBe(0);

    // With the content security policy on, nothing was blocked.
    expect(errors.filter((e) => /Content Security Policy|Refused to/i.test(e))).toEqual([]);
    await organiser.context.close();
    await volunteer.context.close();
  });
});
