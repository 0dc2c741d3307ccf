import { describe, expect, it } from "vitest";
import { ApiClient, signedIn } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";

// The account pages' doors, over plain HTTP (redirects not followed).
describe("signed-in pages", () => {
  it("sends visitors without a session to sign-in, keeping where they were going", async () => {
    const res = await new ApiClient().get("/members");
    expect([307, 308]).toContain(res.status);
    expect(res.headers.get("location")).toMatch(/\/signin\?next=%2Fmembers$/);
  });

  it("does not let a made-up session cookie through: the page checks for itself", async () => {
    const res = await new ApiClient().get("/members", { cookie: "next-auth.session-token=forged" });
    expect([307, 308]).toContain(res.status);
    expect(res.headers.get("location")).toMatch(/\/signin/);
  });

  it("sends a volunteer away from the members page and lets the organiser in", async () => {
    const volunteer = await (await signedIn(DEMO.volunteer)).get("/members");
    expect([307, 308]).toContain(volunteer.status);
    expect(volunteer.headers.get("location")).toMatch(/\/forbidden/);
    const organiser = await (await signedIn(DEMO.organiser)).get("/members");
    expect(organiser.status).toBe(200);
    const html = await organiser.text();
    expect(html).toContain("Invite someone");
    expect(html).toContain("Larkhollow Warm Rooms Circle");
  });

  it.each([
    ["organiser", DEMO.organiser, "/dashboard"],
    ["volunteer", DEMO.volunteer, "/log"],
    ["builder", DEMO.builder, "/units"],
  ])("lands the %s on their own home from /home", async (_role, email, home) => {
    const res = await (await signedIn(email)).get("/home");
    expect([307, 308]).toContain(res.status);
    expect(new URL(res.headers.get("location")!, "http://x").pathname).toBe(home);
  });

  it("explains a link that does not work instead of failing", async () => {
    const res = await new ApiClient().get(`/invite/${"a".repeat(43)}`);
    expect(res.status).toBe(200);
    expect(await res.text()).toContain("This invitation link does not work any more");
  });
});
