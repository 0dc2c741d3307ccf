import { randomBytes } from "node:crypto";
import { testDb } from "@/tests/support/db";
import { DEMO } from "@/tests/support/env";
import type { AuthzRow } from "./types";

// Records the rows below act on: one open invitation in each group, and the
// demo group's people. Created here so fixtures.ts stays shared and small.
async function accountIds() {
  const db = testDb();
  const groupId = async (slug: string) => (await db("groups").where({ slug }).first()).id as string;
  const userId = async (email: string) => (await db("users").where({ email }).first()).id as string;
  const invitation = async (group: string, email: string) => {
    await db("invitations")
      .insert({ group_id: group, email, role: "volunteer", token_hash: randomBytes(32).toString("hex"), expires_at: db.raw("now() + interval '7 days'") })
      .onConflict(db.raw("(group_id, email) where accepted_at is null and revoked_at is null"))
      .ignore();
    return (await db("invitations").where({ group_id: group, email }).whereNull("revoked_at").whereNull("accepted_at").first()).id as string;
  };
  const demo = await groupId("larkhollow-warm-rooms");
  const other = await groupId("brindle-quay-fixers");
  return {
    demoInvitation: await invitation(demo, "authz-demo-invitee@invitee.test"),
    otherInvitation: await invitation(other, "authz-other-invitee@invitee.test"),
    demoOrganiser: await userId(DEMO.organiser),
    demoVolunteer: await userId(DEMO.volunteer),
  };
}

const ids = await accountIds();

const ORGANISERS_ONLY = { anonymous: 401, volunteer: 403, builder: 403 } as const;
const ANYONE_INVALID = { anonymous: 422, volunteer: 422, builder: 422, organiser: 422, otherOrganiser: 422 } as const;

export const rows: AuthzRow[] = [
  {
    route: "app/api/signup/route.ts",
    method: "POST",
    path: () => "/api/signup",
    body: () => ({ name: "", email: "not-an-email", password: "short", groupName: "" }),
    expect: ANYONE_INVALID,
    note: "anyone may start a group; the invalid body shows the input is checked and nothing is written",
  },
  {
    route: "app/api/invitations/route.ts",
    method: "GET",
    path: () => "/api/invitations",
    expect: { ...ORGANISERS_ONLY, organiser: 200, otherOrganiser: 200 },
    note: "each organiser sees their own group's open invitations",
  },
  {
    route: "app/api/invitations/route.ts",
    method: "POST",
    path: () => "/api/invitations",
    body: () => ({ email: "not-an-email", role: "captain" }),
    expect: { ...ORGANISERS_ONLY, organiser: 422, otherOrganiser: 422 },
  },
  {
    route: "app/api/invitations/[id]/route.ts",
    method: "DELETE",
    path: () => `/api/invitations/${ids.otherInvitation}`,
    expect: { ...ORGANISERS_ONLY, organiser: 404, otherOrganiser: 200 },
    note: "the other group's invitation: the demo organiser gets 404 (filtered by group), its own organiser withdraws it",
  },
  {
    route: "app/api/invitations/[id]/resend/route.ts",
    method: "POST",
    path: () => `/api/invitations/${ids.demoInvitation}/resend`,
    expect: { ...ORGANISERS_ONLY, organiser: 200, otherOrganiser: 404 },
  },
  {
    route: "app/api/invitations/accept/route.ts",
    method: "POST",
    path: () => "/api/invitations/accept",
    body: () => ({ token: "too-short" }),
    expect: ANYONE_INVALID,
    note: "the token is the credential, so the door is open to anyone holding one",
  },
  {
    route: "app/api/members/route.ts",
    method: "GET",
    path: () => "/api/members",
    expect: { ...ORGANISERS_ONLY, organiser: 200, otherOrganiser: 200 },
  },
  {
    route: "app/api/members/[userId]/route.ts",
    method: "PATCH",
    path: () => `/api/members/${ids.demoVolunteer}`,
    body: () => ({ role: "captain" }),
    expect: { ...ORGANISERS_ONLY, organiser: 422, otherOrganiser: 404 },
  },
  {
    route: "app/api/members/[userId]/route.ts",
    method: "DELETE",
    path: () => `/api/members/${ids.demoOrganiser}`,
    expect: { ...ORGANISERS_ONLY, organiser: 409, otherOrganiser: 404 },
    note: "the demo group's only organiser: removing them would leave the group without one",
  },
  {
    route: "app/api/password-reset/route.ts",
    method: "POST",
    path: () => "/api/password-reset",
    body: () => ({ email: "not-an-email" }),
    expect: ANYONE_INVALID,
  },
  {
    route: "app/api/password-reset/confirm/route.ts",
    method: "POST",
    path: () => "/api/password-reset/confirm",
    body: () => ({ token: "too-short", password: "x" }),
    expect: ANYONE_INVALID,
  },
  {
    route: "app/api/verify-email/route.ts",
    method: "POST",
    path: () => "/api/verify-email",
    body: () => ({ token: "too-short" }),
    expect: ANYONE_INVALID,
  },
  {
    route: "app/api/verify-email/resend/route.ts",
    method: "POST",
    path: () => "/api/verify-email/resend",
    body: () => ({ email: "not-an-email" }),
    expect: ANYONE_INVALID,
  },
  {
    route: "app/api/me/groups/route.ts",
    method: "GET",
    path: () => "/api/me/groups",
    expect: { anonymous: 401, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
  },
  {
    route: "app/api/group/look/route.ts",
    method: "GET",
    path: () => "/api/group/look",
    expect: { anonymous: 401, volunteer: 200, builder: 200, organiser: 200, otherOrganiser: 200 },
  },
  {
    route: "app/api/group/look/route.ts",
    method: "PUT",
    path: () => "/api/group/look",
    body: () => ({ timeZone: "Not/AZone", locale: "xx", units: "cubits" }),
    expect: { ...ORGANISERS_ONLY, organiser: 422, otherOrganiser: 422 },
    note: "Each organiser acts on their own group only; the invalid body keeps every group's look as it is.",
  },
];
