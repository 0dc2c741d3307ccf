import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { newPage, revealMaps, PHONE, browserForFile, signedInPage } from "@/tests/support/browser";
import { DEMO } from "@/tests/support/env";
import { mailTo, waitForMail } from "@/tests/support/mail";
import { PNG } from "pngjs";

function pngOf(size: number): Buffer {
  const png = new PNG({ width: size, height: size });
  png.data.fill(180);
  return PNG.sync.write(png);
}

const browser = browserForFile();

async function clickMap(page: Page, dx: number, dy: number) {
  const map = page.locator(".leaflet-container").first();
  await map.scrollIntoViewIfNeeded();
  const box = (await map.boundingBox())!;
  await map.click({ position: { x: box.width / 2 + dx, y: box.height / 2 + dy } });
}

describe("organiser sets up a drive; the public uses it", () => {
  it("creates a drive with two drop points placed on the map; a visitor pledges and reports a full bin", async () => {
    const tag = Date.now().toString(36);
    const slug = `lantern-${tag}`;
    const org = await signedInPage(browser(), DEMO.organiser);
    await org.page.goto("/organise/drives/new");
    await org.page.getByLabel("Name", { exact: true }).fill("Lantern Street Winter Drive");
    await org.page.getByLabel("Web address").fill(slug);
    await org.page.getByLabel("Starts on").fill("2026-12-01");
    await org.page.getByLabel("Ends on").fill("2026-11-01");
    await org.page.getByRole("button", { name: "Create drive" }).click();
    // Reversed dates: a message on the field, nothing typed is lost.
    await org.page.getByText("The end date must be on or after the start date.").waitFor();
    expect(await org.page.getByLabel("Name", { exact: true }).inputValue()).toBe("Lantern Street Winter Drive");
    await org.page.getByLabel("Ends on").fill("2027-01-31");
    await org.page.getByRole("button", { name: "Create drive" }).click();
    await org.page.waitForURL(/\/organise\/drives\/[0-9a-f-]{36}$/);
    await revealMaps(org.page);
    await org.page.waitForSelector("img.leaflet-tile-loaded");

    for (const [name, dx, dy] of [["Lantern Street bakery", -60, -30], ["Harbour chandlery", 70, 40]] as const) {
      await clickMap(org.page, dx, dy);
      await org.page.getByRole("heading", { name: "New drop point" }).waitFor({ timeout: 10_000 }).catch(async (e) => {
        await org.page.screenshot({ path: "/tmp/drive-organise-failure.png", fullPage: true });
        throw e;
      });
      const form = org.page.getByRole("form", { name: "Add drop point" });
      await form.getByLabel("Name", { exact: true }).fill(name);
      await form.getByLabel("Opening hours").fill("Daily 8:00–18:00");
      await form.getByLabel("Host phone").fill("+00 555 0177");
      await form.getByRole("button", { name: "Add drop point" }).click();
      await org.page.getByRole("list", { name: "Drop points of this drive" }).getByText(name).waitFor();
    }

    // A photo of the first bin: a wrong type is refused with a message, a picture uploads with progress.
    await org.page.getByRole("link", { name: "Lantern Street bakery", exact: true }).click();
    await org.page.waitForURL(/\/organise\/drop-points\//);
    const picker = org.page.getByLabel("Add a photo of the bin");
    await picker.setInputFiles({ name: "notes.txt", mimeType: "text/plain", buffer: Buffer.from("not a photo") });
    await org.page.getByText("“notes.txt” is not a JPEG, PNG or WebP photo").waitFor();
    // A text file renamed .png gets past the picker but not the server, which reads its bytes.
    await picker.setInputFiles({ name: "fake.png", mimeType: "image/png", buffer: Buffer.from("not an image\n") });
    await org.page.getByText("That file is not a JPEG, PNG or WebP photo, so it was not added.").waitFor({ timeout: 30_000 });
    expect(await org.page.getByText("Photo added.").count()).toBe(0);
    await picker.setInputFiles({ name: "bin.png", mimeType: "image/png", buffer: pngOf(64) });
    await org.page.getByText("Photo added.").waitFor({ timeout: 30_000 });
    await org.page.getByRole("img", { name: "Photo of the bin at Lantern Street bakery" }).waitFor();
    await org.context.close();

    const { context, page } = await newPage(browser(), PHONE);
    await page.goto(`/drives/${slug}`);
    await revealMaps(page);
    await page.waitForSelector("img.leaflet-tile-loaded");
    await expect.poll(() => page.locator(".leaflet-marker-icon").count(), { timeout: 15_000 }).toBe(2);
    await expect.poll(() => page.getByTestId("drop-point").count(), { timeout: 15_000 }).toBe(2);
    expect(await page.content()).not.toContain("555 0177");

    const donor = `donor-${tag}@example.test`;
    await page.getByLabel("Drop point", { exact: true }).selectOption({ label: "Harbour chandlery" });
    await page.getByLabel("About how many bags").fill("3");
    await page.getByLabel("When you will bring them").fill("2026-12-10");
    await page.getByLabel("E-mail for a confirmation (optional)").fill(donor);
    await page.getByRole("button", { name: "Send my pledge" }).click();
    await page.getByText("Thank you — your pledge is in.").waitFor();
    const confirmation = await waitForMail(donor);
    expect(confirmation.text).toContain("Harbour chandlery");

    await page.getByRole("img", { name: "Photo of the bin at Lantern Street bakery" }).waitFor();
    // Each drop point has its own report form (a closed disclosure until opened): work inside this one.
    const bakery = page.getByTestId("drop-point").filter({ hasText: "Lantern Street bakery" });
    const report = async (withPhoto: boolean) => {
      await bakery.getByLabel("Report how full the bin at Lantern Street bakery is").click();
      await bakery.getByLabel("Full — no room left").check();
      if (withPhoto) await bakery.getByLabel("Photo of the bin (optional)").setInputFiles({ name: "full.png", mimeType: "image/png", buffer: pngOf(32) });
      await bakery.getByRole("button", { name: "Send report" }).click();
      await bakery.getByText("Thanks — the organisers can see your report.").waitFor({ timeout: 30_000 });
      if (withPhoto) await bakery.getByText("Your photo is attached.").waitFor();
      await bakery.getByRole("button", { name: "Close" }).click();
    };
    await report(true);
    await report(false);
    const alerts = async () => (await mailTo(DEMO.organiser)).filter((m) => m.subject === "Bin filling up: Lantern Street bakery");
    await expect.poll(alerts, { timeout: 10_000 }).toHaveLength(1);
    await new Promise((r) => setTimeout(r, 1500));
    expect(await alerts()).toHaveLength(1);
    await context.close();
  });
});
