import { describe, expect, it } from "vitest";
import { resolveClientAddress } from "@/scripts/lib/client-chain.mjs";
import { CLIENT_HEADER, clientAddress } from "@/lib/net/client-address";

// X-Forwarded-For semantics: each proxy appends the address it received the
// request from, so only the rightmost N entries (N = proxies we run) are
// trustworthy (MDN, "X-Forwarded-For", security and privacy concerns).
describe("resolveClientAddress", () => {
  it("with no trusted proxy ignores whatever the client wrote", () => {
    expect(resolveClientAddress("198.51.100.7", "203.0.113.9", 0)).toBe("198.51.100.7");
    expect(resolveClientAddress("::ffff:127.0.0.5", undefined, 0)).toBe("127.0.0.5");
  });

  it("with one trusted proxy reads the entry that proxy appended", () => {
    // The client forged "1.2.3.4"; the proxy appended the real 203.0.113.9; the peer is the proxy.
    expect(resolveClientAddress("10.0.0.2", "1.2.3.4, 203.0.113.9", 1)).toBe("203.0.113.9");
    expect(resolveClientAddress("10.0.0.2", ["1.2.3.4", "203.0.113.9"], 1)).toBe("203.0.113.9");
  });

  it("never reads further left than the chain goes", () => {
    expect(resolveClientAddress("10.0.0.2", undefined, 3)).toBe("10.0.0.2");
    expect(resolveClientAddress(undefined, undefined, Number.NaN)).toBe("unknown");
  });
});

describe("clientAddress", () => {
  it("reads only the header the app's own server writes", () => {
    expect(clientAddress(new Headers({ [CLIENT_HEADER]: "203.0.113.9", "x-forwarded-for": "1.2.3.4" }))).toBe("203.0.113.9");
    expect(clientAddress({ "x-forwarded-for": "1.2.3.4" })).toBe("unknown");
    expect(clientAddress(null)).toBe("unknown");
  });
});
