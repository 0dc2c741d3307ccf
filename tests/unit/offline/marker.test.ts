import { describe, expect, it } from "vitest";
import { markerAttributes, offlinePageHtml, personMarker } from "@/lib/offline/marker";

const id = "7d3c2f7e-1b7a-4a7e-9d55-2f0c9c7e8a11";
const group = "0b6c1e52-3f1d-4c0e-8a4b-5d9e2f7a1c33";

describe("the signed-in marker", () => {
  it("is read back from the HTML React renders for it", () => {
    const attrs = markerAttributes({ id, group, home: "/log", renderedAt: "2026-12-04T10:42:00.000Z" });
    const html = `<html><body><div hidden="" ${Object.entries(attrs).map(([k, v]) => `${k}="${v}"`).join(" ")}></div><main>…</main></body></html>`;
    expect(personMarker(html)).toEqual({ id, group, home: "/log", renderedAt: "2026-12-04T10:42:00.000Z" });
  });

  it("is absent from a public page, and a made-up one in page text cannot name a person", () => {
    expect(personMarker("<html><body><h1>Winter drive</h1></body></html>")).toBeNull();
    // A drive's description is escaped by React: quotes become &quot;, so no marker can be faked in text.
    expect(personMarker(`<p>data-cantrove-person=&quot;${id}&quot; data-cantrove-home=&quot;/log&quot;</p>`)).toBeNull();
  });

  it("refuses values that are not an id and a home path", () => {
    expect(() => markerAttributes({ id: "x\" onload=\"", group, home: "/log", renderedAt: "" })).toThrow();
    expect(() => markerAttributes({ id, group: "../../", home: "/log", renderedAt: "" })).toThrow();
    expect(() => markerAttributes({ id, group, home: "https://elsewhere.test", renderedAt: "" })).toThrow();
  });

  it("offline page has no script and points a signed-in person at Log and the runs", () => {
    expect(offlinePageHtml(true)).toContain('href="/log"');
    expect(offlinePageHtml(true)).not.toMatch(/<script/i);
    expect(offlinePageHtml(false)).toContain("Sign in");
  });
});
