import { randomBytes } from "node:crypto";
import { testDb } from "@/tests/support/db";
import { DEMO } from "@/tests/support/env";
import { everyone, expects, row } from "./row";
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

const organisersOnly = (organiser: number, otherOrganiser: number) => expects(401, 403, 403, organiser, otherOrganiser);
const ANYONE_INVALID = everyone(422);

export const rows: AuthzRow[] = [
  row("POST", "signup", "/api/signup", ANYONE_INVALID, {
    body: () => ({ name: "", email: "not-an-email", password: "short", groupName: "" }),
    note: "anyone may start a group; the invalid body shows the input is checked and nothing is written",
  }),
  row("GET", "invitations", "/api/invitations", organisersOnly(200, 200), { note: "each organiser sees their own group's open invitations" }),
  row("POST", "invitations", "/api/invitations", organisersOnly(422, 422), { body: () => ({ email: "not-an-email", role: "captain" }) }),
  row("DELETE", "invitations/[id]", `/api/invitations/${ids.otherInvitation}`, organisersOnly(404, 200), {
    note: "the other group's invitation: the demo organiser gets 404 (filtered by group), its own organiser withdraws it",
  }),
  row("POST", "invitations/[id]/resend", `/api/invitations/${ids.demoInvitation}/resend`, organisersOnly(200, 404)),
  row("POST", "invitations/accept", "/api/invitations/accept", ANYONE_INVALID, {
    body: () => ({ token: "too-short" }),
    note: "the token is the credential, so the door is open to anyone holding one",
  }),
  row("GET", "members", "/api/members", organisersOnly(200, 200)),
  row("PATCH", "members/[userId]", `/api/members/${ids.demoVolunteer}`, organisersOnly(422, 404), { body: () => ({ role: "captain" }) }),
  row("DELETE", "members/[userId]", `/api/members/${ids.demoOrganiser}`, organisersOnly(409, 404), {
    note: "the demo group's only organiser: removing them would leave the group without one",
  }),
  row("POST", "password-reset", "/api/password-reset", ANYONE_INVALID, { body: () => ({ email: "not-an-email" }) }),
  row("POST", "password-reset/confirm", "/api/password-reset/confirm", ANYONE_INVALID, { body: () => ({ token: "too-short", password: "x" }) }),
  row("POST", "verify-email", "/api/verify-email", ANYONE_INVALID, { body: () => ({ token: "too-short" }) }),
  row("POST", "verify-email/resend", "/api/verify-email/resend", ANYONE_INVALID, { body: () => ({ email: "not-an-email" }) }),
  row("GET", "me/groups", "/api/me/groups", expects(401, 200, 200, 200, 200)),
  row("GET", "group/look", "/api/group/look", expects(401, 200, 200, 200, 200)),
  row("PUT", "group/look", "/api/group/look", organisersOnly(422, 422), {
    body: () => ({ timeZone: "Not/AZone", locale: "xx", units: "cubits" }),
    note: "each organiser acts on their own group only; the invalid body keeps every group's look as it is",
  }),
];
