import { afterAll, describe, expect, it } from "vitest";
import { APP_URL, DEMO, DEMO_PASSWORD } from "@/tests/support/env";
import { closeTestDb } from "@/tests/support/db";
import { call, signInFrom } from "./sign-in-from";

afterAll(closeTestDb);

const from = "127.0.0.61";
const origin = new URL(APP_URL).origin;

describe("next-auth's redirects stay on this site", () => {
  it("keeps a same-site callbackUrl and sends any other host home", async () => {
    const kept = await signInFrom(from, DEMO.volunteer, DEMO_PASSWORD, { fields: { callbackUrl: `${APP_URL}/log?x=1` } });
    expect(kept).toMatchObject({ status: 200, signedIn: true, url: `${origin}/log?x=1` });
    for (const callbackUrl of ["https://evil.example/phish", "//evil.example/", "/\\evil.example/", "http://127.0.0.1:1/"]) {
      const res = await signInFrom(from, DEMO.volunteer, DEMO_PASSWORD, { fields: { callbackUrl } });
      expect(res.status, callbackUrl).toBe(200);
      expect(new URL(res.url).origin, callbackUrl).toBe(origin);
      expect(new URL(res.url).pathname, callbackUrl).toBe("/");
    }
  });

  it("answers an unparseable callbackUrl without a 500, in the form and in the cookie", async () => {
    const inForm = await signInFrom(from, DEMO.volunteer, DEMO_PASSWORD, { fields: { callbackUrl: "http://[::1" } });
    expect(inForm).toMatchObject({ status: 200, signedIn: true, url: origin });
    // In the query: sent back once with callbackUrl=/ instead of next-auth's 500.
    const page = await call(from, "GET", "/api/auth/signin?callbackUrl=http%3A%2F%2F%5B%3A%3A1");
    expect(page.status).toBe(307);
    const location = new URL(page.location ?? "", APP_URL);
    expect(location.searchParams.get("callbackUrl")).toBe("/");
    const repaired = await call(from, "GET", location.pathname + location.search);
    expect(repaired.status).toBeLessThan(500);
    // In the cookie: cleared, and the session endpoint answers once it is gone.
    const bad = `next-auth.callback-url=${encodeURIComponent("http://[::1")}`;
    const session = await call(from, "GET", "/api/auth/session", undefined, { cookie: bad });
    expect(session.status).toBe(307);
    expect(session.cookies).toContain("next-auth.callback-url=");
    expect((await call(from, "GET", "/api/auth/session")).status).toBe(200);
  });
});
