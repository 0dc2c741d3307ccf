import { describe, expect, it } from "vitest";
import { signedIn } from "@/tests/support/http";

// The demo's person in two groups (seed 03): lands in the first, lists both, switches.
describe("the demo person in two groups", () => {
  it("lists both groups with the role in each and switches the active one", async () => {
    const client = await signedIn("two-groups@cantrove.test");
    const groups = await client.json<{ id: string; slug: string; role: string; active: boolean }[]>("GET", "/api/me/groups");
    expect(groups.body.map((g) => [g.slug, g.role, g.active]).sort()).toEqual([
      ["brindle-quay-fixers", "builder", false],
      ["larkhollow-warm-rooms", "volunteer", true],
    ]);
    const other = groups.body.find((g) => g.slug === "brindle-quay-fixers")!;
    const csrf = await client.json<{ csrfToken: string }>("GET", "/api/auth/csrf");
    await client.request("POST", "/api/auth/session", { csrfToken: csrf.body.csrfToken, data: { groupId: other.id } });
    const me = await client.json<{ group: { slug: string }; role: string }>("GET", "/api/me");
    expect(me.body).toMatchObject({ group: { slug: "brindle-quay-fixers" }, role: "builder" });
    // The drives listed now are the other group's only.
    const drives = await client.json<{ slug: string }[]>("GET", "/api/drives");
    expect(drives.body.map((d) => d.slug)).not.toContain("larkhollow-winter-2026");
  });

  it("a switch to a group the person is not in changes nothing (the same POST the page's switcher sends)", async () => {
    const client = await signedIn("volunteer@cantrove.test");
    const before = await client.json<{ group: { id: string; slug: string }; role: string }>("GET", "/api/me");
    const other = await signedIn("organiser@elsewhere.test");
    const theirs = (await other.json<{ group: { id: string } }>("GET", "/api/me")).body.group.id;
    expect(theirs).not.toBe(before.body.group.id);
    const csrf = await client.json<{ csrfToken: string }>("GET", "/api/auth/csrf");
    await client.request("POST", "/api/auth/session", { csrfToken: csrf.body.csrfToken, data: { groupId: theirs } });
    const after = await client.json<{ group: { slug: string }; role: string }>("GET", "/api/me");
    expect(after.body).toMatchObject({ group: { slug: before.body.group.slug }, role: before.body.role });
  });
});
