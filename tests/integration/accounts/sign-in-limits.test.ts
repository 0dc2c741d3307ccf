import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { PAIR_LIMIT } from "@/lib/accounts/sign-in-rules";
import { PASSWORD, freshGroup, linkToken, uniqueEmail } from "./helpers";
import { csrfFrom, signInFrom } from "./sign-in-from";

afterAll(closeTestDb);

const PLAIN_MISS = "CredentialsSignin";
const PAIR_REFUSAL = /Too many sign-in tries for this e-mail from your network\. Try again in .*reset your password/;

describe("sign-in limits", () => {
  it("checks at most the limit of 100 parallel wrong guesses against the hash; the owner elsewhere still gets in", async () => {
    const { email } = await freshGroup();
    const from = "127.0.0.41";
    const csrf = await csrfFrom(from);
    const answers = await Promise.all(Array.from({ length: 100 }, (_, i) => signInFrom(from, email, `wrong-guess-${i}`, { csrf })));
    const checked = answers.filter((a) => a.error === PLAIN_MISS).length;
    const refused = answers.filter((a) => a.error && PAIR_REFUSAL.test(a.error)).length;
    expect(answers.every((a) => a.status === 401 && !a.signedIn)).toBe(true);
    expect(checked).toBeGreaterThanOrEqual(1);
    expect(checked).toBeLessThanOrEqual(PAIR_LIMIT);
    expect(checked + refused).toBe(100);

    // Even the right password is refused from there now ...
    expect((await signInFrom(from, email, PASSWORD)).error).toMatch(PAIR_REFUSAL);
    // ... but the owner on another network is not locked out by a stranger.
    expect((await signInFrom("127.0.0.42", email, PASSWORD)).signedIn).toBe(true);
  }, 60_000);

  it("is not escaped by sending another X-Forwarded-For with every guess", async () => {
    const { email } = await freshGroup();
    const from = "127.0.0.44";
    const answers = [];
    // The test server trusts one proxy hop, as behind one load balancer: the client writes what it
    // likes on the left, the proxy appends the address it saw (here the same one every time).
    for (let i = 0; i < PAIR_LIMIT + 3; i += 1) {
      const forged = { "x-forwarded-for": `203.0.113.${i + 1}, ${from}`, "x-cantrove-client": `198.51.100.${i}` };
      answers.push(await signInFrom(from, email, `wrong-${i}`, { headers: forged }));
    }
    expect(answers.slice(0, PAIR_LIMIT).map((a) => a.error)).toEqual(Array(PAIR_LIMIT).fill(PLAIN_MISS));
    for (const a of answers.slice(PAIR_LIMIT)) expect(a.error).toMatch(PAIR_REFUSAL);
  }, 60_000);

  it("backs off in steps, the same for an unknown address, and a password reset opens it again", async () => {
    const { email } = await freshGroup();
    const from = "127.0.0.45";
    for (let i = 0; i < 5; i += 1) expect((await signInFrom(from, email, `wrong-${i}`)).error).toBe(PLAIN_MISS);
    const first = await signInFrom(from, email, PASSWORD);
    expect(first.error).toMatch(/Try again in a minute/);
    // The same refusal for an address with no account: the limit says nothing about who has one.
    const ghost = uniqueEmail("ghost");
    for (let i = 0; i < 5; i += 1) await signInFrom(from, ghost, "guess-guess");
    expect((await signInFrom(from, ghost, "guess-guess")).error).toBe(first.error);

    // The minute passes (its window is moved into the past): 4 more tries, then a quarter of an hour.
    await testDb()("rate_limits").whereRaw("starts_with(key, ?)", [`sign-in-pair-minute:${email}|`]).update({ expire: Date.now() - 1 });
    for (let i = 0; i < 4; i += 1) expect((await signInFrom(from, email, `again-${i}`)).error).toBe(PLAIN_MISS);
    expect((await signInFrom(from, email, PASSWORD)).error).toMatch(/Try again in 1[45] minutes/);

    // The reset mail is the way out: after it, the new password works from that same address.
    await new ApiClient().json("POST", "/api/password-reset", { email });
    const token = await linkToken(email, "password_reset", "reset");
    expect((await new ApiClient().json("POST", "/api/password-reset/confirm", { token, password: "a-fresh-long-password" })).status).toBe(200);
    expect((await signInFrom(from, email, "a-fresh-long-password")).signedIn).toBe(true);
  }, 60_000);

  it("refuses a client address after 50 failures across many e-mails, and no other address", async () => {
    const { email } = await freshGroup();
    const from = "127.0.0.46";
    const csrf = await csrfFrom(from);
    const answers = await Promise.all(Array.from({ length: 50 }, (_, i) => signInFrom(from, `spray-${i}-${email}`, "guess-guess", { csrf })));
    expect(answers.every((a) => a.error === PLAIN_MISS)).toBe(true);
    const res = await signInFrom(from, email, PASSWORD);
    expect(res.signedIn).toBe(false);
    expect(res.error).toMatch(/Too many failed sign-ins from your network\. Try again in 1[45] minutes/);
    expect((await signInFrom("127.0.0.47", email, PASSWORD)).signedIn).toBe(true);
  }, 60_000);

  it("keeps its counts in PostgreSQL, where every app server sees them, and gives the try back on success", async () => {
    const { email } = await freshGroup();
    const from = "127.0.0.48";
    await signInFrom(from, email, "wrong-wrong");
    const pair = await testDb()("rate_limits").where({ key: `sign-in-pair-quarter:${email}|${from}` }).first();
    expect(pair.points).toBe(1);
    expect((await signInFrom(from, email, PASSWORD)).signedIn).toBe(true);
    expect(await testDb()("rate_limits").where({ key: `sign-in-pair-quarter:${email}|${from}` }).first()).toBeUndefined();
    expect((await testDb()("rate_limits").where({ key: `sign-in-client:${from}` }).first()).points).toBe(1);
  });
});
