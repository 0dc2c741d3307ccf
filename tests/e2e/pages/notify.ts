import type { Page } from "playwright-core";

// Page objects for search, the members page's hand-over and the person's own settings.
export const searchBox = {
  /** The header's search box, as an organiser types into it. */
  async search(page: Page, words: string) {
    await page.getByRole("search").first().getByLabel("Search the group\u2019s records").fill(words);
    await page.getByRole("search").first().getByRole("button", { name: "Search" }).click();
    await page.waitForURL((url) => url.pathname === "/search");
    await page.getByRole("heading", { name: /^Search / }).waitFor();
  },
  results(page: Page, kind: string) {
    return page.getByRole("region", { name: new RegExp(`^${kind}`) });
  },
};

export const handOverCard = {
  async handOver(page: Page, to: string, then: RegExp) {
    await page.goto("/members");
    await page.getByRole("heading", { name: "Hand the group over" }).waitFor();
    await page.getByLabel("New organiser").selectOption({ label: to });
    await page.getByRole("radio", { name: then }).check();
    await page.getByRole("button", { name: "Hand over…" }).click();
    await page.getByRole("button", { name: /^Hand over to / }).click();
  },
};

export const settingsPage = {
  async open(page: Page) {
    await page.goto("/account");
    await page.getByRole("heading", { name: "My settings" }).waitFor();
  },
  toggle(page: Page, label: string) {
    return page.getByRole("checkbox", { name: new RegExp(label) });
  },
  async save(page: Page) {
    await page.getByRole("button", { name: "Save e-mail settings" }).click();
    await page.getByText("Your e-mail settings are stored.").waitFor();
  },
};
