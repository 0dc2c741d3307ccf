import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { mailTo } from "@/tests/support/mail";
import { PASSWORD, freshGroup, invitationToken, uniqueEmail } from "./helpers";

afterAll(closeTestDb);

type Me = { user: { email: string; name: string }; group: { id: string }; role: string };

describe("invitations", () => {
  it("e-mails a single-use link that creates the account with the invited role", async () => {
    const { client, groupId } = await freshGroup();
    const email = uniqueEmail("volunteer");
    const created = await client.json<{ id: string; role: string; email: string }>("POST", "/api/invitations", { email, role: "volunteer" });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ email, role: "volunteer" });

    const token = await invitationToken(email);
    const [mail] = await mailTo(email);
    expect(mail.headers["x-cantrove-group"]).toBe(groupId);
    // Only a hash of the token is kept.
    const row = await testDb()("invitations").where({ id: created.body.id }).first();
    expect(row.token_hash).not.toContain(token);
    expect(row.token_hash).toMatch(/^[0-9a-f]{64}$/);
    // Seven days, give or take the test's own run time.
    const days = (new Date(row.expires_at).getTime() - new Date(row.created_at).getTime()) / 86_400_000;
    expect(days).toBeCloseTo(7, 3);

    const accept = await new ApiClient().json("POST", "/api/invitations/accept", { token, name: "Vera Invitee", password: PASSWORD });
    expect(accept.status).toBe(201);

    const person = new ApiClient();
    expect(await person.signIn(email, PASSWORD)).toBe(200);
    const me = await person.json<Me>("GET", "/api/me");
    expect(me.body).toMatchObject({ user: { email, name: "Vera Invitee" }, group: { id: groupId }, role: "volunteer" });

    // The same link again: used, so refused, and no second account or membership.
    const again = await new ApiClient().json("POST", "/api/invitations/accept", { token, name: "Someone Else", password: PASSWORD });
    expect(again.status).toBe(404);
    expect(await testDb()("users").where({ email }).count("* as n").first()).toEqual({ n: "1" });
    const pending = await client.json<unknown[]>("GET", "/api/invitations");
    expect(pending.body).toEqual([]);
  });

  it("refuses an expired link with 409 and writes nothing", async () => {
    const { client } = await freshGroup();
    const email = uniqueEmail("late");
    const created = await client.json<{ id: string }>("POST", "/api/invitations", { email, role: "builder" });
    const token = await invitationToken(email);
    await testDb()("invitations").where({ id: created.body.id }).update({ expires_at: testDb().raw("now() - interval '1 second'") });

    const res = await new ApiClient().json<{ error: { code: string; message: string } }>("POST", "/api/invitations/accept", {
      token,
      name: "Late Comer",
      password: PASSWORD,
    });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/expired/);
    expect(await testDb()("users").where({ email }).first()).toBeUndefined();
    // The organiser sees it as expired and can resend: a new link, the old one dead.
    const list = await client.json<{ id: string; expired: boolean }[]>("GET", "/api/invitations");
    expect(list.body).toEqual([expect.objectContaining({ id: created.body.id, expired: true })]);
    const seen = new Set((await mailTo(email)).map((m) => m.id));
    expect((await client.json("POST", `/api/invitations/${created.body.id}/resend`)).status).toBe(200);
    const fresh = await invitationToken(email, seen);
    expect(fresh).not.toBe(token);
    expect((await new ApiClient().json("POST", "/api/invitations/accept", { token, name: "Late Comer", password: PASSWORD })).status).toBe(404);
    expect((await new ApiClient().json("POST", "/api/invitations/accept", { token: fresh, name: "Late Comer", password: PASSWORD })).status).toBe(201);
  });

  it("withdrawn invitations stop working", async () => {
    const { client } = await freshGroup();
    const email = uniqueEmail("withdrawn");
    const created = await client.json<{ id: string }>("POST", "/api/invitations", { email, role: "volunteer" });
    const token = await invitationToken(email);
    expect((await client.json("DELETE", `/api/invitations/${created.body.id}`)).status).toBe(200);
    expect((await new ApiClient().json("POST", "/api/invitations/accept", { token, name: "N", password: PASSWORD })).status).toBe(404);
  });

  it("answers bad input with 422 field errors and writes nothing", async () => {
    const { client, groupId } = await freshGroup();
    const before = await testDb()("invitations").where({ group_id: groupId }).count("* as n").first();
    const res = await client.json<{ error: { fields: Record<string, string> } }>("POST", "/api/invitations", { email: "nope", role: "captain" });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["email", "role"]);
    expect(await testDb()("invitations").where({ group_id: groupId }).count("* as n").first()).toEqual(before);

    const email = uniqueEmail("short");
    await client.json("POST", "/api/invitations", { email, role: "volunteer" });
    const token = await invitationToken(email);
    const weak = await new ApiClient().json<{ error: { fields: Record<string, string> } }>("POST", "/api/invitations/accept", { token, name: "Short", password: "short" });
    expect(weak.status).toBe(422);
    expect(weak.body.error.fields.password).toMatch(/10 characters/);
    expect(await testDb()("users").where({ email }).first()).toBeUndefined();
  });

  it("adds the group to an existing account once they sign in, and they can switch groups", async () => {
    const first = await freshGroup("First Circle");
    const second = await freshGroup("Second Circle");
    const created = await second.client.json<{ id: string }>("POST", "/api/invitations", { email: first.email, role: "builder" });
    expect(created.status).toBe(201);
    const token = await invitationToken(first.email);

    const anonymous = await new ApiClient().json<{ error: { code: string } }>("POST", "/api/invitations/accept", { token });
    expect(anonymous.status).toBe(401);
    const wrongPerson = await second.client.json("POST", "/api/invitations/accept", { token });
    expect(wrongPerson.status).toBe(409);

    expect((await first.client.json("POST", "/api/invitations/accept", { token })).status).toBe(201);
    const groups = await first.client.json<{ id: string; role: string; active: boolean }[]>("GET", "/api/me/groups");
    expect(groups.body.map((g) => [g.id, g.role, g.active]).sort()).toEqual(
      [
        [first.groupId, "organiser", true],
        [second.groupId, "builder", false],
      ].sort(),
    );

    // Switching: next-auth's session update with the group id (what the header's switcher sends).
    const csrf = await first.client.json<{ csrfToken: string }>("GET", "/api/auth/csrf");
    const update = await first.client.request("POST", "/api/auth/session", { csrfToken: csrf.body.csrfToken, data: { groupId: second.groupId } });
    expect(update.status).toBe(200);
    const me = await first.client.json<Me>("GET", "/api/me");
    expect(me.body).toMatchObject({ group: { id: second.groupId }, role: "builder" });
    expect((await first.client.json("GET", "/api/members")).status).toBe(403);

    // A group the person does not belong to is ignored.
    const other = await freshGroup("Third Circle");
    await first.client.request("POST", "/api/auth/session", { csrfToken: csrf.body.csrfToken, data: { groupId: other.groupId } });
    expect((await first.client.json<Me>("GET", "/api/me")).body.group.id).toBe(second.groupId);

    // Removed from the active group, the person's sessions end; signed in again, they carry on in the group they still belong to.
    const firstUser = (await testDb()("users").where({ email: first.email }).first()).id;
    expect((await second.client.json("DELETE", `/api/members/${firstUser}`)).status).toBe(200);
    expect((await first.client.json("GET", "/api/me")).status).toBe(401);
    const again = new ApiClient();
    expect(await again.signIn(first.email, PASSWORD)).toBe(200);
    expect((await again.json<Me>("GET", "/api/me")).body).toMatchObject({ group: { id: first.groupId }, role: "organiser" });
  });
});
