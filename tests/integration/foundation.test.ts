import { afterAll, describe, expect, it } from "vitest";
import { ApiClient, signedIn } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { closeTestDb, testDb } from "@/tests/support/db";

afterAll(closeTestDb);

describe("health", () => {
  it("reports the database up", async () => {
    const res = await new ApiClient().json("GET", "/api/health");
    expect(res).toEqual({ status: 200, body: { status: "ok", db: "up" } });
  });
});

describe("/api/me", () => {
  it("is 401 with the contract's error JSON for anonymous callers", async () => {
    const res = await new ApiClient().json<{ error: { code: string; message: string } }>("GET", "/api/me");
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe("unauthenticated");
    expect(res.body.error.message.length).toBeGreaterThan(0);
  });

  it.each([
    [DEMO.organiser, "larkhollow-warm-rooms", "organiser"],
    [DEMO.volunteer, "larkhollow-warm-rooms", "volunteer"],
    [DEMO.builder, "larkhollow-warm-rooms", "builder"],
    [DEMO.otherOrganiser, "brindle-quay-fixers", "organiser"],
  ])("reports %s in %s as %s", async (email, slug, role) => {
    const client = await signedIn(email);
    const res = await client.json<{ user: { email: string }; group: { slug: string; name: string; id: string }; role: string }>("GET", "/api/me");
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(email);
    expect(res.body.group.slug).toBe(slug);
    expect(res.body.role).toBe(role);
    // The group and role come from the database, not from what the client sent.
    const membership = await testDb()("memberships as m")
      .join("users as u", "u.id", "m.user_id")
      .join("groups as g", "g.id", "m.group_id")
      .where("u.email", email)
      .select("g.id", "g.name", "m.role")
      .first();
    expect(res.body.group).toMatchObject({ id: membership.id, name: membership.name });
    expect(membership.role).toBe(role);
  });

  it("refuses a wrong password with 401 and no session", async () => {
    const client = new ApiClient();
    expect(await client.signIn(DEMO.organiser, "not-the-password")).toBe(401);
    expect(client.hasSession()).toBe(false);
  });
});

describe("drives", () => {
  it("lists only the caller's group's drives", async () => {
    const mine = await (await signedIn(DEMO.organiser)).json<{ slug: string }[]>("GET", "/api/drives");
    const theirs = await (await signedIn(DEMO.otherOrganiser)).json<{ slug: string }[]>("GET", "/api/drives");
    const db = testDb();
    const demoSlugs = await db("drives as d").join("groups as g", "g.id", "d.group_id").where("g.slug", "larkhollow-warm-rooms").pluck("d.slug");
    expect(mine.body.map((d) => d.slug).sort()).toEqual([...demoSlugs].sort());
    expect(theirs.body.map((d) => d.slug)).not.toContain("larkhollow-winter-2026");
  });

  it("lists public drives for anyone with the contract's fields only", async () => {
    const res = await new ApiClient().json<Record<string, unknown>[]>("GET", "/api/public/drives");
    expect(res.status).toBe(200);
    expect(res.body.length).toBeGreaterThan(0);
    for (const d of res.body) expect(Object.keys(d).sort()).toEqual(["endsOn", "name", "slug", "startsOn"]);
  });
});
