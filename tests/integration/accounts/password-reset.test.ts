import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb } from "@/tests/support/db";
import { mailTo, waitForMail } from "@/tests/support/mail";
import { PASSWORD, freshGroup, uniqueEmail } from "./helpers";

afterAll(closeTestDb);

const NEW_PASSWORD = "another-long-password";

async function resetLink(email: string): Promise<string> {
  const mail = await waitForMail(email, (m) => m.headers["x-cantrove-kind"] === "password_reset");
  const match = mail.text.match(/\/reset\/([A-Za-z0-9_-]+)/);
  if (!match) throw new Error("no reset link");
  return match[1];
}

describe("password reset", () => {
  it("gives the same answer for an address with and without an account", async () => {
    const { email } = await freshGroup();
    const unknown = uniqueEmail("nobody");
    const known = await new ApiClient().json("POST", "/api/password-reset", { email });
    const missing = await new ApiClient().json("POST", "/api/password-reset", { email: unknown });
    expect(known.status).toBe(202);
    expect(missing).toEqual(known);
    // Only the real account gets a message.
    await resetLink(email);
    await new Promise((r) => setTimeout(r, 500));
    expect(await mailTo(unknown)).toEqual([]);
  });

  it("sets a new password through a single-use link", async () => {
    const { email } = await freshGroup();
    await new ApiClient().json("POST", "/api/password-reset", { email });
    const token = await resetLink(email);

    const weak = await new ApiClient().json<{ error: { fields: Record<string, string> } }>("POST", "/api/password-reset/confirm", { token, password: "short" });
    expect(weak.status).toBe(422);
    expect(weak.body.error.fields.password).toBeTruthy();
    // The 422 wrote nothing: the link still works and the old password too.
    expect(await new ApiClient().signIn(email, PASSWORD)).toBe(200);

    expect((await new ApiClient().json("POST", "/api/password-reset/confirm", { token, password: NEW_PASSWORD })).status).toBe(200);
    expect(await new ApiClient().signIn(email, PASSWORD)).toBe(401);
    expect(await new ApiClient().signIn(email, NEW_PASSWORD)).toBe(200);
    const again = await new ApiClient().json("POST", "/api/password-reset/confirm", { token, password: "yet-another-password" });
    expect(again.status).toBe(404);
    expect(await new ApiClient().signIn(email, NEW_PASSWORD)).toBe(200);
  });
});
