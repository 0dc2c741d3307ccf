import { describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";

// Every page names its icon, and the old /favicon.ico address answers too: a
// missing icon is a console error on every page load.
describe("the site's icon", () => {
  it("is linked from the pages and served at /favicon.ico as the same SVG", async () => {
    const anon = new ApiClient();
    const page = await (await anon.get("/")).text();
    const href = /<link rel="icon" href="([^"]+)"/.exec(page)?.[1];
    expect(href).toMatch(/^\/icon\.svg/);
    const linked = await anon.get(href!);
    expect(linked.status).toBe(200);
    expect(linked.headers.get("content-type")).toContain("image/svg+xml");
    const old = await anon.get("/favicon.ico");
    expect(old.status).toBe(200);
    expect(await old.text()).toBe(await linked.text());
  });
});
