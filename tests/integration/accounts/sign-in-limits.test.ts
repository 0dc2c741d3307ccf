import http from "node:http";
import { afterAll, describe, expect, it } from "vitest";
import { APP_URL } from "@/tests/support/env";
import { closeTestDb, testDb } from "@/tests/support/db";
import { PASSWORD, freshGroup, uniqueEmail } from "./helpers";

afterAll(closeTestDb);

// Sign-in over plain node:http so each test can come from its own loopback
// address (127.0.0.x): the server sees a distinct client, and the other test
// files signing in from 127.0.0.1 are not slowed by these failures.
function call(localAddress: string, method: string, path: string, body?: string, cookie = "", type?: string) {
  return new Promise<{ status: number; text: string; cookies: string[] }>((resolve, reject) => {
    const url = new URL(path, APP_URL);
    const req = http.request(
      { host: url.hostname, port: url.port, path: url.pathname + url.search, method, localAddress, headers: { cookie, ...(type ? { "content-type": type } : {}) } },
      (res) => {
        let text = "";
        res.on("data", (c) => (text += c));
        res.on("end", () => resolve({ status: res.statusCode ?? 0, text, cookies: (res.headers["set-cookie"] ?? []).map((c) => c.split(";")[0]) }));
      },
    );
    req.on("error", reject);
    req.end(body);
  });
}

async function signInFrom(localAddress: string, email: string, password: string) {
  const csrf = await call(localAddress, "GET", "/api/auth/csrf");
  const { csrfToken } = JSON.parse(csrf.text);
  const form = new URLSearchParams({ csrfToken, email, password, json: "true" }).toString();
  const res = await call(localAddress, "POST", "/api/auth/callback/credentials", form, csrf.cookies.join("; "), "application/x-www-form-urlencoded");
  const url = res.text ? (JSON.parse(res.text) as { url: string }).url : "";
  return { status: res.status, error: new URL(url, APP_URL).searchParams.get("error"), signedIn: res.cookies.some((c) => c.includes("session-token=")) };
}

describe("failed sign-in limits", () => {
  it("slows, then refuses an e-mail after 10 failures, even with the right password, with a clear message", async () => {
    const { email } = await freshGroup();
    const from = "127.0.0.21";
    const times: number[] = [];
    for (let i = 0; i < 10; i += 1) {
      const started = Date.now();
      const res = await signInFrom(from, email, `wrong-password-${i}`);
      times.push(Date.now() - started);
      expect(res).toMatchObject({ status: 401, error: "CredentialsSignin", signedIn: false });
    }
    // From the third failure on, each try waits 250 ms longer: lower bounds
    // only, since a busy machine can add time but never take the wait away.
    expect(times[5]).toBeGreaterThanOrEqual(750);
    expect(times[9]).toBeGreaterThanOrEqual(1_750);

    const refused = await signInFrom(from, email, PASSWORD);
    expect(refused.status).toBe(401);
    expect(refused.signedIn).toBe(false);
    expect(refused.error).toMatch(/Too many failed sign-ins for this e-mail.*try again in 15 minutes/);

    // The same answer for an address without an account: the limit reveals nothing.
    const unknown = uniqueEmail("ghost");
    for (let i = 0; i < 10; i += 1) await signInFrom(from, unknown, "guess");
    expect((await signInFrom(from, unknown, "guess")).error).toBe(refused.error);

    // The count lives in PostgreSQL, so every app server sees it.
    const rows = await testDb()("sign_in_failures").where({ email }).count("* as n").first();
    expect(Number(rows?.n)).toBe(10);
    // Once the failures age out of the 15-minute window, the right password works again.
    await testDb()("sign_in_failures").where({ email }).update({ at: testDb().raw("now() - interval '16 minutes'") });
    expect((await signInFrom(from, email, PASSWORD)).signedIn).toBe(true);
  }, 60_000);

  it("refuses a client address after 50 failures across many e-mails", async () => {
    const from = "127.0.0.22";
    const { email } = await freshGroup();
    // Earlier failures from this address, as if made a minute ago across many e-mails.
    await testDb()("sign_in_failures").insert(
      Array.from({ length: 50 }, (_, i) => ({ email: `spray-${i}@accounts.test`, client: from, at: testDb().raw("now() - interval '1 minute'") })),
    );
    const res = await signInFrom(from, email, PASSWORD);
    expect(res.signedIn).toBe(false);
    expect(res.error).toMatch(/Too many failed sign-ins from this network.*try again in 14 minutes/);
    // Another address is not affected.
    expect((await signInFrom("127.0.0.23", email, PASSWORD)).signedIn).toBe(true);
  });
});
