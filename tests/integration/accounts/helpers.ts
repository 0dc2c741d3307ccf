import { randomBytes } from "node:crypto";
import { expect } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { waitForMail } from "@/tests/support/mail";

export const PASSWORD = "a-long-test-password";

export const uniqueEmail = (who: string) => `${who}-${randomBytes(4).toString("hex")}@accounts.test`;

/** A token from the newest mail of one kind to an address: the link's last path segment after `/<segment>/`. */
export async function linkToken(email: string, kind: string, segment: string, after: Set<string> = new Set()): Promise<string> {
  const mail = await waitForMail(email, (m) => m.headers["x-cantrove-kind"] === kind && !after.has(m.id));
  const match = mail.text.match(new RegExp(`/${segment}/([A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`no /${segment}/ link in: ${mail.text}`);
  return match[1];
}

/** Opens the confirmation link mailed at sign-up, as the person would: its page proves the address. */
export async function proveAddress(email: string): Promise<void> {
  const token = await linkToken(email, "email_verification", "verify");
  const page = await new ApiClient().get(`/verify/${token}`);
  expect(page.status).toBe(200);
  expect(await page.text()).toContain("Your address is confirmed");
}

/** A fresh group made through sign-up, its address proven from the mail, with its organiser signed in. */
export async function freshGroup(name = "Test Circle", email = uniqueEmail("organiser")) {
  const anonymous = new ApiClient();
  const res = await anonymous.json<{ group: { id: string; slug: string } }>("POST", "/api/signup", {
    name: "Olwen Test",
    email,
    password: PASSWORD,
    groupName: name,
  });
  expect(res.status).toBe(201);
  await proveAddress(email);
  const client = new ApiClient();
  expect(await client.signIn(email, PASSWORD)).toBe(200);
  return { client, email, groupId: res.body.group.id, slug: res.body.group.slug };
}

/** The token from the newest invitation e-mail to an address (the link's last path segment). */
export async function invitationToken(email: string, after: Set<string> = new Set()): Promise<string> {
  return linkToken(email, "invitation", "invite", after);
}
