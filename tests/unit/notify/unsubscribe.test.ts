import { beforeAll, describe, expect, it } from "vitest";

// The unsubscribe link's token: signed with the server's secret, so it cannot be
// guessed or moved to another person or kind.
beforeAll(() => {
  process.env.DATABASE_URL ??= "postgres://127.0.0.1:1/none";
  process.env.NEXTAUTH_SECRET ??= "unit-test-secret-0123456789";
  process.env.APP_URL = "http://127.0.0.1:3000";
});

const USER = "3f0c2a5e-9b1d-4c7a-8e2f-6a5b4c3d2e1f";
const OTHER = "7d9e1f20-3a4b-4c5d-8e6f-708192a3b4c5";

describe("unsubscribe tokens", async () => {
  const { readUnsubscribeToken, unsubscribeHeaders, unsubscribeToken } = await import("@/lib/notify/unsubscribe");
  const { unsubscribeTokenSchema } = await import("@/lib/notify/schemas");

  it("reads back the person and kind it was made for, and fits the route's path schema", () => {
    const token = unsubscribeToken(USER, "weeklySummary");
    expect(unsubscribeTokenSchema.safeParse(token).success).toBe(true);
    expect(readUnsubscribeToken(token)).toEqual({ userId: USER, kind: "weeklySummary" });
  });

  it("refuses a token moved to another person or kind, or altered", () => {
    const token = unsubscribeToken(USER, "runReminder");
    const [, , sig] = token.split(".");
    expect(readUnsubscribeToken(`${OTHER.replaceAll("-", "")}.runReminder.${sig}`)).toBeNull();
    expect(readUnsubscribeToken(`${USER.replaceAll("-", "")}.unitReady.${sig}`)).toBeNull();
    expect(readUnsubscribeToken(`${USER.replaceAll("-", "")}.nonsense.${sig}`)).toBeNull();
    expect(readUnsubscribeToken(token.slice(0, -1) + (token.endsWith("A") ? "B" : "A"))).toBeNull();
    expect(readUnsubscribeToken("")).toBeNull();
  });

  it("gives the RFC 8058 header pair with one https URI, even when the app's own URL is http", () => {
    // RFC 8058 §3.1 (from memory): List-Unsubscribe "MUST contain one HTTPS URI"; List-Unsubscribe-Post
    // "MUST contain the single key/value pair List-Unsubscribe=One-Click".
    const headers = unsubscribeHeaders(USER, "unitReady");
    expect(headers["List-Unsubscribe"]).toMatch(/^<https:\/\/127\.0\.0\.1:3000\/api\/unsubscribe\/[0-9a-f]{32}\.unitReady\.[A-Za-z0-9_-]{43}>$/);
    expect(headers["List-Unsubscribe-Post"]).toBe("List-Unsubscribe=One-Click");
  });
});
