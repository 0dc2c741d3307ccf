import { afterAll, describe, expect, it } from "vitest";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { PASSWORD, freshGroup, invitationToken, linkToken, uniqueEmail } from "./helpers";

afterAll(closeTestDb);

const VICTIM_PASSWORD = "the-real-owners-password";

type Groups = { id: string; role: string }[];

async function signInClient(email: string, password: string) {
  const client = new ApiClient();
  const status = await client.signIn(email, password);
  return { client, status, hasSession: client.hasSession() };
}

async function resetPassword(email: string, password: string, seen = new Set<string>()) {
  expect((await new ApiClient().json("POST", "/api/password-reset", { email })).status).toBe(202);
  const token = await linkToken(email, "password_reset", "reset", seen);
  expect((await new ApiClient().json("POST", "/api/password-reset/confirm", { token, password })).status).toBe(200);
}

describe("sessions end when they must", () => {
  it("pre-hijack: a stranger who signs up with someone's address never gets a session, and the owner takes it over", async () => {
    const victim = uniqueEmail("victim");
    const signup = await new ApiClient().json("POST", "/api/signup", { name: "Mallory", email: victim, password: PASSWORD, groupName: "Trap Circle" });
    expect(signup.status).toBe(201);
    const attacker = await signInClient(victim, PASSWORD);
    expect(attacker.hasSession).toBe(false);
    expect((await attacker.client.json("GET", "/api/me")).status).toBe(401);

    const { client: organiser, groupId } = await freshGroup("Owner's Circle");
    expect((await organiser.json("POST", "/api/invitations", { email: victim, role: "organiser" })).status).toBe(201);
    const inviteToken = await invitationToken(victim);
    await resetPassword(victim, VICTIM_PASSWORD);
    const owner = await signInClient(victim, VICTIM_PASSWORD);
    expect(owner.status).toBe(200);
    expect((await owner.client.json("POST", "/api/invitations/accept", { token: inviteToken })).status).toBe(201);
    const groups = await owner.client.json<Groups>("GET", "/api/me/groups");
    expect(groups.body.map((g) => g.id)).toContain(groupId);
    // The stranger's password is gone with the reset.
    expect((await signInClient(victim, PASSWORD)).hasSession).toBe(false);
  });

  it("pre-hijack, owner fooled into opening the first link: the stranger's session dies at the owner's reset", async () => {
    const victim = uniqueEmail("fooled");
    await new ApiClient().json("POST", "/api/signup", { name: "Mallory", email: victim, password: PASSWORD, groupName: "Trap Circle" });
    const verify = await linkToken(victim, "email_verification", "verify");
    expect((await new ApiClient().json("POST", "/api/verify-email", { token: verify })).status).toBe(200);
    const attacker = await signInClient(victim, PASSWORD);
    expect(attacker.status).toBe(200);
    expect((await attacker.client.json("GET", "/api/me")).status).toBe(200);

    const { client: organiser, groupId } = await freshGroup("Owner's Circle");
    await organiser.json("POST", "/api/invitations", { email: victim, role: "organiser" });
    const inviteToken = await invitationToken(victim);
    await resetPassword(victim, VICTIM_PASSWORD);
    // Dead at once, before the owner even accepts.
    expect((await attacker.client.json("GET", "/api/me")).status).toBe(401);
    const owner = await signInClient(victim, VICTIM_PASSWORD);
    expect((await owner.client.json("POST", "/api/invitations/accept", { token: inviteToken })).status).toBe(201);
    // Still dead after: it cannot see or switch to the owner's new group.
    expect((await attacker.client.json("GET", "/api/me/groups")).status).toBe(401);
    expect((await attacker.client.json("GET", "/api/drives")).status).toBe(401);
    expect((await owner.client.json<Groups>("GET", "/api/me/groups")).body.map((g) => g.id)).toContain(groupId);
  });

  it("a verified person with two sessions resets the password: the other session answers 401", async () => {
    const { email } = await freshGroup();
    const phone = await signInClient(email, PASSWORD);
    const laptop = await signInClient(email, PASSWORD);
    expect((await phone.client.json("GET", "/api/me")).status).toBe(200);
    expect((await laptop.client.json("GET", "/api/me")).status).toBe(200);
    await resetPassword(email, VICTIM_PASSWORD);
    expect((await phone.client.json("GET", "/api/me")).status).toBe(401);
    expect((await laptop.client.json("GET", "/api/me")).status).toBe(401);
    const again = await signInClient(email, VICTIM_PASSWORD);
    expect((await again.client.json("GET", "/api/me")).status).toBe(200);
  });

  it("removal from a group ends the removed person's sessions, even in their other groups", async () => {
    const member = await freshGroup("Member's own circle");
    const { client: organiser } = await freshGroup("Removing circle");
    await organiser.json("POST", "/api/invitations", { email: member.email, role: "volunteer" });
    const token = await invitationToken(member.email);
    expect((await member.client.json("POST", "/api/invitations/accept", { token })).status).toBe(201);
    expect((await member.client.json("GET", "/api/me")).status).toBe(200);
    const userId = (await testDb()("users").where({ email: member.email }).first()).id;
    expect((await organiser.json("DELETE", `/api/members/${userId}`)).status).toBe(200);
    expect((await member.client.json("GET", "/api/me")).status).toBe(401);
    // Signing in again works, in the group they still belong to.
    const back = await signInClient(member.email, PASSWORD);
    expect((await back.client.json<{ group: { id: string } }>("GET", "/api/me")).body.group.id).toBe(member.groupId);
  });

  it("an address nobody proved cannot join a group: its invitation waits until the address is proven", async () => {
    const email = uniqueEmail("unproven");
    await new ApiClient().json("POST", "/api/signup", { name: "Una Proven", email, password: PASSWORD, groupName: "Unproven Circle" });
    const { client: organiser, groupId } = await freshGroup("Inviting circle");
    await organiser.json("POST", "/api/invitations", { email, role: "volunteer" });
    const token = await invitationToken(email);
    const denied = await new ApiClient().json<{ error: { code: string } }>("POST", "/api/invitations/accept", { token, name: "Una", password: PASSWORD });
    expect(denied.status).toBe(401);
    const refused = await signInClient(email, PASSWORD);
    expect(refused.hasSession).toBe(false);
    expect(await testDb()("memberships").where({ group_id: groupId }).count("* as n").first()).toEqual({ n: "1" });
  });
});
