import type { Page } from "playwright-core";

// Page objects for the account pages, so tests read as the user's steps.
export const membersPage = {
  async open(page: Page) {
    await page.goto("/members");
    await page.getByRole("heading", { name: /People in/ }).waitFor();
  },
  async invite(page: Page, email: string, role: "organiser" | "volunteer" | "builder") {
    await page.getByLabel("Their e-mail").fill(email);
    await page.getByLabel("Role", { exact: true }).selectOption(role);
    await page.getByRole("button", { name: "Send invitation", exact: true }).click();
    await page.getByText(`Invitation sent to ${email}`).waitFor();
  },
  openInvitations(page: Page) {
    return page.getByRole("list", { name: "Open invitations" });
  },
};

export const invitationPage = {
  async accept(page: Page, link: string, name: string, password: string) {
    await page.goto(link);
    await page.getByLabel("Your name").fill(name);
    await page.getByLabel("Choose a password").fill(password);
    await page.getByRole("button", { name: "Join the group" }).click();
    await page.waitForURL((url) => url.pathname === "/signin");
  },
};
