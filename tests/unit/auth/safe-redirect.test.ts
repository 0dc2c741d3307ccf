import { describe, expect, it } from "vitest";
import { isSafePath, keptCallbackUrl, safeCallbackUrl, safeRedirect } from "@/lib/auth/safe-redirect";

// The open-redirect shapes browsers read as another host: OWASP's
// "Unvalidated Redirects and Forwards Cheat Sheet" and the WHATWG URL
// standard's treatment of "\" as "/" in special URLs (from memory).
describe("safe redirects", () => {
  it("keeps same-site paths with their query and fragment", () => {
    for (const path of ["/", "/dashboard", "/drives/x?tab=map#top", "/a/b/../c"]) expect(safeRedirect(path, "/log")).toBe(path);
  });

  it("sends everything that could leave the site to the fallback", () => {
    const bad = ["//evil.example/", "/\\evil.example/", "/\\/evil.example", "https://evil.example/", "evil.example", "javascript:alert(1)",
      "/\tevil", "/\n/evil.example", "/ok\u0000", "/ok\u007f", "\\\\evil.example", " /dashboard", "", null, undefined, 42, ["/x"]];
    for (const target of bad) expect(safeRedirect(target, "/units")).toBe("/units");
  });

  it("falls back to / when the fallback itself is not a safe path", () => {
    expect(safeRedirect("//evil.example", "//evil.example")).toBe("/");
    expect(isSafePath("/\\evil.example/")).toBe(false);
  });

  it("keeps next-auth's callbackUrl on this site, absolute or relative, and survives one that is not a URL", () => {
    const base = "http://127.0.0.1:3000";
    expect(safeCallbackUrl("/dashboard", base)).toBe(`${base}/dashboard`);
    expect(safeCallbackUrl(`${base}/log?x=1`, base)).toBe(`${base}/log?x=1`);
    expect(safeCallbackUrl("https://evil.example/phish", base)).toBe(base);
    expect(safeCallbackUrl("/\\evil.example/", base)).toBe(base);
    expect(safeCallbackUrl("http://[::1", base)).toBe(base);
    expect(safeCallbackUrl("http://127.0.0.1:3001/", base)).toBe(base);
  });

  it("keeps a callbackUrl as it is only when it is safe, else replaces it by /", () => {
    const origins = ["http://127.0.0.1:3000"];
    expect(keptCallbackUrl("/log?x=1", origins)).toBe("/log?x=1");
    expect(keptCallbackUrl("http://127.0.0.1:3000/units", origins)).toBe("http://127.0.0.1:3000/units");
    for (const bad of ["http://[::1", "https://evil.example/", "/\\evil.example/", "http://127.0.0.1:3000//evil.example"]) expect(keptCallbackUrl(bad, origins)).toBe("/");
    expect(keptCallbackUrl("/", origins)).toBe("/");
  });
});
