import { randomBytes } from "node:crypto";
import { expect } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { waitForMail } from "@/tests/support/mail";

export const PASSWORD = "a-long-test-password";

export const uniqueEmail = (who: string) => `${who}-${randomBytes(4).toString("hex")}@accounts.test`;

/** A fresh group made through sign-up, with its organiser signed in. */
export async function freshGroup(name = "Test Circle") {
  const email = uniqueEmail("organiser");
  const anonymous = new ApiClient();
  const res = await anonymous.json<{ group: { id: string; slug: string } }>("POST", "/api/signup", {
    name: "Olwen Test",
    email,
    password: PASSWORD,
    groupName: name,
  });
  expect(res.status).toBe(201);
  const client = new ApiClient();
  expect(await client.signIn(email, PASSWORD)).toBe(200);
  return { client, email, groupId: res.body.group.id, slug: res.body.group.slug };
}

/** The token from the newest invitation e-mail to an address (the link's last path segment). */
export async function invitationToken(email: string, after: Set<string> = new Set()): Promise<string> {
  const mail = await waitForMail(email, (m) => m.headers["x-cantrove-kind"] === "invitation" && !after.has(m.id));
  const match = mail.text.match(/\/invite\/([A-Za-z0-9_-]+)/);
  if (!match) throw new Error(`no invitation link in: ${mail.text}`);
  return match[1];
}
