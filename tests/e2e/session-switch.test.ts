import { describe, it } from "vitest";
import { browserForFile, signedInPage } from "@/tests/support/browser";
import { volunteerInTwoGroups } from "@/tests/support/ledger";

// Signed-in pages carry no next-auth provider (components/auth/session-client.ts):
// switching the active group rewrites the session through next-auth's own update
// endpoint, and signing out goes through next-auth's sign-out, loaded on the click.
const browser = browserForFile();

describe("the session without a provider on the page", () => {
  it("switches a person in two groups to the other group's home, which stays after a reload; then signs out", async () => {
    const { a, nameB: groupB } = await volunteerInTwoGroups("switch", "organiser");
    const { context, page } = await signedInPage(browser(), a.emails.volunteer, { viewport: { width: 1366, height: 900 } });
    try {
      const switcher = page.getByLabel("Active group");
      await switcher.waitFor();
      await switcher.selectOption({ label: `${groupB} (organiser)` });
      // An organiser's home in group B, named in the header; the cookie itself changed, so a reload keeps it.
      await page.waitForURL((u) => u.pathname === "/dashboard", { timeout: 15_000 });
      await page.getByRole("banner").getByText(groupB, { exact: true }).waitFor();
      await page.reload();
      await page.getByRole("banner").getByText(groupB, { exact: true }).waitFor();
      await page.getByRole("button", { name: "Sign out" }).first().click();
      await page.waitForURL((u) => u.pathname === "/signin", { timeout: 15_000 });
      await page.goto("/dashboard");
      await page.waitForURL((u) => u.pathname === "/signin");
    } finally {
      await context.close();
    }
  });
});
