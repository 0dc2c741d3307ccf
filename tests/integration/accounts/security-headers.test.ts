import { describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";

// Directive names and values as defined in CSP Level 3 (W3C); X-Content-Type-Options per the Fetch standard.
const directives = (policy: string) => new Map(policy.split(";").map((d) => d.trim()).filter(Boolean).map((d) => [d.split(" ")[0]!, d] as const));

async function headersOf(path: string) {
  const res = await new ApiClient().get(path);
  await res.arrayBuffer();
  return res.headers;
}

describe("security headers", () => {
  it.each(["/", "/signin", "/plan", "/drives/larkhollow-winter-2026", "/no-such-page"])("a page (%s) gets a nonce-based policy from proxy.ts", async (path) => {
    const h = await headersOf(path);
    const policies = h.get("content-security-policy") ?? "";
    // One policy only: a second one (next.config.mjs) would be enforced as well.
    expect(policies).not.toContain(",");
    const d = directives(policies);
    expect(d.get("script-src")).toMatch(/^script-src 'self' 'nonce-[A-Za-z0-9+/]+=*' 'strict-dynamic'$/);
    expect(d.get("default-src")).toBe("default-src 'self'");
    expect(d.get("object-src")).toBe("object-src 'none'");
    expect(d.get("frame-ancestors")).toBe("frame-ancestors 'none'");
    expect(d.get("base-uri")).toBe("base-uri 'self'");
    // Local mode (the app on 127.0.0.1): the upload fake's exact origin, never every loopback port.
    expect(d.get("img-src")).toMatch(/^img-src 'self' data: blob: http:\/\/127\.0\.0\.1:\d+$/);
    expect(d.get("connect-src")).toMatch(/^connect-src 'self' http:\/\/127\.0\.0\.1:\d+$/);
    expect(policies).not.toContain(":*");
    expect(h.get("x-content-type-options")).toBe("nosniff");
    expect(h.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    expect(h.get("x-powered-by")).toBeNull();
  });

  it("gives every page answer its own nonce", async () => {
    const nonces = await Promise.all(Array.from({ length: 5 }, async () => /'nonce-([^']+)'/.exec((await headersOf("/signin")).get("content-security-policy") ?? "")?.[1]));
    expect(nonces.every(Boolean)).toBe(true);
    expect(new Set(nonces).size).toBe(5);
  });

  it.each(["/api/health", "/api/me", "/tiles/does-not-exist.png", "/_next/static/does-not-exist.js"])("%s (not a page) gets a policy under which nothing loads", async (path) => {
    const h = await headersOf(path);
    const policies = h.get("content-security-policy") ?? "";
    expect(policies).not.toContain(",");
    const d = directives(policies);
    expect(d.get("default-src")).toBe("default-src 'none'");
    expect(d.get("frame-ancestors")).toBe("frame-ancestors 'none'");
    expect(d.has("script-src")).toBe(false);
    expect(h.get("x-content-type-options")).toBe("nosniff");
    expect(h.get("x-powered-by")).toBeNull();
  });
});
