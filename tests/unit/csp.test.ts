import { describe, expect, it } from "vitest";
import { isLocalMode, newNonce, policyTemplate, uploadOrigins } from "@/lib/csp";

// Directive names and keywords as defined in Content Security Policy Level 3 (W3C).
const directive = (policy: string, name: string) => policy.split("; ").find((d) => d.startsWith(`${name} `)) ?? "";

const LOCAL = { APP_URL: "http://127.0.0.1:3000", UPLOADTHING_INGEST_URL: "http://127.0.0.1:8026", UPLOADTHING_API_URL: "http://127.0.0.1:8026/" };
const PUBLIC = { APP_URL: "https://cans.example.org", UPLOADTHING_INGEST_URL: "http://127.0.0.1:8026", CANTROVE_UPLOAD_ORIGINS: "https://files.example.org/some/path https://ingest.example.net" };

describe("the page policy", () => {
  it("allows scripts only by nonce, never inline", () => {
    const policy = policyTemplate(LOCAL);
    const scripts = directive(policy, "script-src");
    expect(scripts).toBe("script-src 'self' 'nonce-{nonce}' 'strict-dynamic'");
    expect(policy).not.toMatch(/script-src[^;]*'unsafe-inline'/);
    expect(policy).not.toContain("'unsafe-eval'");
    for (const d of ["default-src 'self'", "object-src 'none'", "base-uri 'self'", "frame-ancestors 'none'", "form-action 'self'"]) expect(policy).toContain(d);
  });

  it("adds 'unsafe-eval' only for next dev, as React's development build needs", () => {
    expect(directive(policyTemplate({ ...LOCAL, NODE_ENV: "development" }), "script-src")).toContain("'unsafe-eval'");
    expect(directive(policyTemplate({ ...LOCAL, NODE_ENV: "production" }), "script-src")).not.toContain("'unsafe-eval'");
  });

  it("names the local upload service's exact origin, never every loopback port", () => {
    const policy = policyTemplate(LOCAL);
    expect(directive(policy, "img-src")).toBe("img-src 'self' data: blob: http://127.0.0.1:8026");
    expect(directive(policy, "connect-src")).toBe("connect-src 'self' http://127.0.0.1:8026");
    expect(policy).not.toContain(":*");
    expect(policy).not.toContain("localhost");
  });

  it("drops loopback origins when the app is not served on loopback, and keeps configured ones", () => {
    expect(isLocalMode(PUBLIC)).toBe(false);
    expect(uploadOrigins(PUBLIC)).toEqual(["https://files.example.org", "https://ingest.example.net"]);
    const policy = policyTemplate(PUBLIC);
    expect(policy).not.toContain("127.0.0.1");
    expect(policy).toContain("upgrade-insecure-requests");
    expect(policyTemplate(LOCAL)).not.toContain("upgrade-insecure-requests");
  });

  it("ignores values that are not http(s) origins", () => {
    expect(uploadOrigins({ ...LOCAL, UPLOADTHING_INGEST_URL: "not a url", UPLOADTHING_API_URL: "javascript:alert(1)", CANTROVE_UPLOAD_ORIGINS: "  " })).toEqual([]);
  });
});

describe("nonces", () => {
  it("are base64 and never repeat", () => {
    const seen = new Set(Array.from({ length: 1000 }, newNonce));
    expect(seen.size).toBe(1000);
    for (const n of seen) expect(n).toMatch(/^[A-Za-z0-9+/]+=*$/);
  });
});
