import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { closeTestDb, testDb } from "@/tests/support/db";
import { PASSWORD, uniqueEmail } from "./helpers";

afterAll(closeTestDb);

describe("sign-up", () => {
  it("creates the person and a new group with them as its organiser", async () => {
    const email = uniqueEmail("founder");
    const res = await new ApiClient().json<{ group: { id: string; slug: string; name: string }; role: string }>("POST", "/api/signup", {
      name: "Ansel Founder",
      email: email.toUpperCase(),
      password: PASSWORD,
      groupName: "Fennick Street Can Club",
    });
    expect(res.status).toBe(201);
    expect(res.body.group.slug).toMatch(/^fennick-street-can-club-[0-9a-f]{6}$/);
    const client = new ApiClient();
    expect(await client.signIn(email, PASSWORD)).toBe(200);
    const me = await client.json<{ user: { email: string }; group: { id: string; name: string }; role: string }>("GET", "/api/me");
    expect(me.body).toMatchObject({ user: { email }, group: { id: res.body.group.id, name: "Fennick Street Can Club" }, role: "organiser" });
    const stored = await testDb()("users").where({ email }).first();
    expect(stored.password_hash).toMatch(/^\$2[aby]\$10\$/);
  });

  it("answers bad input with 422 field errors and writes nothing", async () => {
    const groupsBefore = await testDb()("groups").count("* as n").first();
    const res = await new ApiClient().json<{ error: { code: string; fields: Record<string, string> } }>("POST", "/api/signup", {
      name: "",
      email: "nope",
      password: "short",
      groupName: "x",
    });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_input");
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["email", "groupName", "name", "password"]);
    expect(await testDb()("groups").count("* as n").first()).toEqual(groupsBefore);
  });

  it("refuses an e-mail that already has an account, on the e-mail field", async () => {
    const groupsBefore = await testDb()("groups").count("* as n").first();
    const res = await new ApiClient().json<{ error: { fields: Record<string, string> } }>("POST", "/api/signup", {
      name: "Copy Cat",
      email: DEMO.volunteer,
      password: PASSWORD,
      groupName: "Another Circle",
    });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.email).toMatch(/already has an account/);
    expect(await testDb()("groups").count("* as n").first()).toEqual(groupsBefore);
  });
});
