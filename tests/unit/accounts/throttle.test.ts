import { describe, expect, it } from "vitest";
import { THROTTLE, refusalMessage, throttleDecision } from "@/lib/accounts/throttle";
import { hashToken, newToken, slugify } from "@/lib/accounts/tokens";

describe("throttleDecision", () => {
  it("lets the first failures through at full speed", () => {
    expect(throttleDecision(0, 0)).toEqual({ kind: "allow", delayMs: 0 });
    expect(throttleDecision(THROTTLE.email.slowAfter - 1, 0)).toEqual({ kind: "allow", delayMs: 0 });
  });

  it("waits longer with each further failure for the same e-mail, up to the cap", () => {
    const delays = Array.from({ length: 7 }, (_, i) => throttleDecision(THROTTLE.email.slowAfter + i, 0)).map((d) =>
      d.kind === "allow" ? d.delayMs : -1,
    );
    expect(delays).toEqual([250, 500, 750, 1000, 1250, 1500, 1750]);
    expect(throttleDecision(9, 45)).toEqual({ kind: "allow", delayMs: 2000 });
  });

  it("refuses at 10 failures for an e-mail or 50 for a client address", () => {
    expect(throttleDecision(10, 0)).toEqual({ kind: "refuse", by: "email" });
    expect(throttleDecision(0, 50)).toEqual({ kind: "refuse", by: "client" });
    expect(throttleDecision(12, 60)).toEqual({ kind: "refuse", by: "email" });
  });

  it("says how long to wait", () => {
    expect(refusalMessage("email", 15)).toMatch(/try again in 15 minutes, or reset your password/);
    expect(refusalMessage("client", 1)).toMatch(/try again in a minute/);
  });
});

describe("tokens", () => {
  it("stores SHA-256 of the link token", () => {
    // FIPS 180-2, appendix B.1: SHA-256("abc") (the published digest, written here from memory).
    expect(hashToken("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    const { token, hash } = newToken();
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(hash).toBe(hashToken(token));
    expect(newToken().token).not.toBe(token);
  });

  it("makes group slugs from names", () => {
    expect(slugify("Larkhollow Warm Rooms Circle", "a1b2c3")).toBe("larkhollow-warm-rooms-circle-a1b2c3");
    expect(slugify("Café Œuvre!!", "000000")).toBe("cafe-uvre-000000");
    expect(slugify("***", "ffffff")).toBe("group-ffffff");
  });
});
