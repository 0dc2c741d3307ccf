import { describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";

// Every response carries the headers; checked on a page, an API answer and a static file.
describe("security headers", () => {
  it.each(["/", "/signin", "/api/health", "/api/me", "/tiles/does-not-exist.png"])("are on %s", async (path) => {
    const res = await new ApiClient().get(path);
    await res.arrayBuffer();
    const csp = res.headers.get("content-security-policy") ?? "";
    // Directive names and values as defined in CSP Level 3 (W3C).
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toMatch(/img-src 'self' data: blob: [^;]*http:\/\/127\.0\.0\.1:\*/);
    expect(csp).toMatch(/connect-src 'self' [^;]*http:\/\/127\.0\.0\.1:\*/);
    // Fetch standard: the only value of X-Content-Type-Options is nosniff.
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    expect(res.headers.get("x-powered-by")).toBeNull();
  });
});
