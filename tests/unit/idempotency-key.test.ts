import { afterEach, describe, expect, it, vi } from "vitest";
import { newKey } from "@/lib/api/idempotency-key";

// The server takes 1–200 visible ASCII characters (lib/api/idempotency.ts).
const ACCEPTED = /^[\x21-\x7e]{1,200}$/;

describe("newKey", () => {
  afterEach(() => vi.unstubAllGlobals());

  it("is a fresh UUID where randomUUID exists", () => {
    const [a, b] = [newKey(), newKey()];
    expect(a).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(a).not.toBe(b);
  });

  it("falls back to 128 random bits in hex outside a secure context (no randomUUID)", () => {
    const real = globalThis.crypto;
    vi.stubGlobal("crypto", { getRandomValues: (a: Uint8Array) => real.getRandomValues(a) });
    const [a, b] = [newKey(), newKey()];
    expect(a).toMatch(/^[0-9a-f]{32}$/);
    expect(a).toMatch(ACCEPTED);
    expect(a).not.toBe(b);
  });
});
