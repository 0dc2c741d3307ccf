import { describe, expect, it } from "vitest";
import { decode, encode } from "next-auth/jwt";
import { decodeSession } from "@/lib/auth/session-token";

// Our session decoding keeps next-auth's derived key instead of deriving it
// per request. It must read exactly what next-auth writes, and refuse what
// next-auth refuses, so an upgrade that changes the format fails here first.
const secret = "a test secret that is long enough for HKDF";
const claims = { sub: "3f0c1d2e-0000-4000-8000-000000000001", email: "wren@example.test", groupId: "g-1", sessionVersion: 3 };

describe("session token decoding", () => {
  it("reads a token made by next-auth's encode exactly as next-auth's decode does", async () => {
    const token = await encode({ token: claims, secret });
    const ours = await decodeSession({ token, secret });
    const theirs = await decode({ token, secret });
    expect(ours).toEqual(theirs);
    expect(ours).toMatchObject(claims);
  });

  it("refuses a token made with another secret, and an altered one", async () => {
    const token = await encode({ token: claims, secret: "another secret entirely, also long" });
    await expect(decodeSession({ token, secret })).rejects.toThrow();
    const good = await encode({ token: claims, secret });
    const altered = good.slice(0, -4) + (good.endsWith("AAAA") ? "BBBB" : "AAAA");
    await expect(decodeSession({ token: altered, secret })).rejects.toThrow();
  });

  it("refuses an expired token", async () => {
    const token = await encode({ token: claims, secret, maxAge: -60 });
    await expect(decodeSession({ token, secret })).rejects.toThrow();
  });
});
