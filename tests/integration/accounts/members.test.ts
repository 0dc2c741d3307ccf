import { afterAll, describe, expect, it } from "vitest";
import { ApiClient, signedIn } from "@/tests/support/http";
import { DEMO } from "@/tests/support/env";
import { closeTestDb, testDb } from "@/tests/support/db";
import { PASSWORD, freshGroup, invitationToken, uniqueEmail } from "./helpers";

afterAll(closeTestDb);

type Member = { userId: string; email: string; role: string };

async function addMember(client: ApiClient, role: string) {
  const email = uniqueEmail(role);
  await client.json("POST", "/api/invitations", { email, role });
  const token = await invitationToken(email);
  expect((await new ApiClient().json("POST", "/api/invitations/accept", { token, name: `New ${role}`, password: PASSWORD })).status).toBe(201);
  const person = new ApiClient();
  expect(await person.signIn(email, PASSWORD)).toBe(200);
  const members = await client.json<Member[]>("GET", "/api/members");
  return { person, email, userId: members.body.find((m) => m.email === email)!.userId };
}

describe("members", () => {
  it("never lets the last organiser be demoted or removed (409, nothing changes)", async () => {
    const { client } = await freshGroup();
    const [me] = (await client.json<Member[]>("GET", "/api/members")).body;
    const demote = await client.json<{ error: { code: string; message: string } }>("PATCH", `/api/members/${me.userId}`, { role: "volunteer" });
    expect(demote.status).toBe(409);
    expect(demote.body.error.message).toMatch(/at least one organiser/);
    expect((await client.json("DELETE", `/api/members/${me.userId}`)).status).toBe(409);
    expect((await client.json<{ role: string }>("GET", "/api/me")).body.role).toBe("organiser");
  });

  it("changes roles and removes members; access follows at once", async () => {
    const { client, groupId } = await freshGroup();
    const helper = await addMember(client, "volunteer");
    expect((await helper.person.json("GET", "/api/members")).status).toBe(403);

    const promote = await client.json<Member>("PATCH", `/api/members/${helper.userId}`, { role: "organiser" });
    expect(promote.status).toBe(200);
    expect(promote.body.role).toBe("organiser");
    // The role is read from the database each request, so the same session now has it.
    expect((await helper.person.json("GET", "/api/members")).status).toBe(200);

    // With two organisers, one may step down.
    const [first] = (await client.json<Member[]>("GET", "/api/members")).body.filter((m) => m.email !== helper.email);
    expect((await helper.person.json("PATCH", `/api/members/${first.userId}`, { role: "builder" })).status).toBe(200);
    // …but then the remaining one cannot.
    expect((await helper.person.json("PATCH", `/api/members/${helper.userId}`, { role: "volunteer" })).status).toBe(409);

    const removed = await addMember(helper.person, "builder");
    expect((await helper.person.json("DELETE", `/api/members/${removed.userId}`)).status).toBe(200);
    expect(await testDb()("memberships").where({ group_id: groupId, user_id: removed.userId }).first()).toBeUndefined();
    expect((await removed.person.json("GET", "/api/me")).status).toBe(401);
  });

  it("answers another group's members with 404 and a bad role with 422", async () => {
    const { client } = await freshGroup();
    const demoVolunteer = await testDb()("users").where({ email: DEMO.volunteer }).first();
    expect((await client.json("PATCH", `/api/members/${demoVolunteer.id}`, { role: "organiser" })).status).toBe(404);
    expect((await client.json("DELETE", `/api/members/${demoVolunteer.id}`)).status).toBe(404);
    expect((await client.json("PATCH", "/api/members/not-a-uuid", { role: "organiser" })).status).toBe(404);
    const demo = await signedIn(DEMO.organiser);
    const bad = await demo.json<{ error: { fields: Record<string, string> } }>("PATCH", `/api/members/${demoVolunteer.id}`, { role: "captain" });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.role).toBeTruthy();
    const still = await testDb()("memberships").where({ user_id: demoVolunteer.id }).first();
    expect(still.role).toBe("volunteer");
  });
});
