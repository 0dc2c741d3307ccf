import { describe, expect, it } from "vitest";
import { PHONE, browserForFile, newPage, signInAs, signedInPage } from "@/tests/support/browser";
import { testDb } from "@/tests/support/db";
import { createOwnGroup } from "@/tests/support/own-group";
import { handOverCard, searchBox, settingsPage } from "./pages/notify";

// Issue 16's browser journeys: an organiser finds a drop point by a word of its
// notes, an organiser hands the group over and leaves, and a person switches a
// kind of e-mail off on their settings page.
const browser = browserForFile();

describe("finding things", () => {
  it("the organiser's search finds a drop point by a word of its notes and links to it", async () => {
    const db = testDb();
    const g = await createOwnGroup(db, "e2e-search", { dropPoint: "Tinker's yard crate" });
    const other = await createOwnGroup(db, "e2e-search-other", { dropPoint: "Harbour crate" });
    for (const id of [g.dropPointId, other.dropPointId]) {
      await db("drop_points").where({ id }).update({ access_notes: "Crate under the periwinkle awning" });
    }
    const { page, context } = await signedInPage(browser(), g.emails.organiser, PHONE);
    await searchBox.search(page, "periwinkle");
    const found = searchBox.results(page, "Drop points");
    await found.getByRole("link", { name: /Tinker's yard crate/ }).waitFor();
    expect(await page.getByText("Harbour crate").count()).toBe(0);
    await found.getByRole("link", { name: /Tinker's yard crate/ }).click();
    await page.waitForURL((url) => url.pathname === `/organise/drop-points/${g.dropPointId}`);
    await context.close();
  });
});

describe("handing over and leaving", () => {
  it("the only organiser hands the group to the builder and leaves; the builder now organises", async () => {
    const db = testDb();
    const g = await createOwnGroup(db, "e2e-handover");
    const { page, context } = await signedInPage(browser(), g.emails.organiser);
    // Leaving first is not offered: the settings page says to hand over.
    await settingsPage.open(page);
    await page.getByText(/You are the only organiser/).waitFor();
    await handOverCard.handOver(page, "builder of e2e-handover (Builder)", /Leave the group/);
    await page.waitForURL((url) => url.pathname === "/signin");
    const roles = await db("memberships as m").join("users as u", "u.id", "m.user_id").where("m.group_id", g.groupId).select("u.email", "m.role");
    expect(roles.find((r) => r.email === g.emails.organiser)).toBeUndefined();
    expect(roles.find((r) => r.email === g.emails.builder)?.role).toBe("organiser");
    // The old organiser's session is over: the members page sends them to sign in.
    await page.goto("/members");
    await page.waitForURL((url) => url.pathname === "/signin");
    await context.close();

    const next = await newPage(browser(), PHONE);
    await signInAs(next.page, g.emails.builder);
    expect(new URL(next.page.url()).pathname).toBe("/dashboard");
    await next.context.close();
  });
});

describe("notification settings", () => {
  it("a volunteer switches pickup run reminders off, and the switch stays off", async () => {
    const db = testDb();
    const g = await createOwnGroup(db, "e2e-notify");
    const { page, context } = await signedInPage(browser(), g.emails.volunteer, PHONE);
    await page.getByRole("link", { name: "My settings" }).click();
    await page.getByRole("heading", { name: "My settings" }).waitFor();
    const reminders = settingsPage.toggle(page, "Pickup run reminders");
    expect(await reminders.isChecked()).toBe(true);
    await reminders.uncheck();
    await settingsPage.save(page);
    const userId = (await db("users").where({ email: g.emails.volunteer }).first()).id;
    expect(await db("notification_optouts").where({ user_id: userId }).pluck("kind")).toEqual(["runReminder"]);
    await settingsPage.open(page);
    expect(await settingsPage.toggle(page, "Pickup run reminders").isChecked()).toBe(false);
    expect(await settingsPage.toggle(page, "Weekly summary").isChecked()).toBe(true);
    await context.close();
  });
});
