import { testDb } from "@/tests/support/db";
import { DEMO } from "@/tests/support/env";
import { everyone, expects, row } from "./row";
import type { AuthzRow } from "./types";

// Search, leaving and handing over, notification settings and the unsubscribe link (issue 16).
const volunteerId = (await testDb()("users").where({ email: DEMO.volunteer }).first()).id as string;
// Well formed (it passes the path schema) but not signed by the server: a guess.
const FORGED_TOKEN = `${"0".repeat(32)}.runReminder.${"A".repeat(43)}`;
const members = (status: number) => expects(401, status, status, status, status);

export const rows: AuthzRow[] = [
  row("GET", "search", "/api/search?q=porch", expects(401, 403, 403, 200, 200), { note: "each organiser searches their own group only (tests/integration/notify/search.test.ts)" }),
  row("POST", "me/leave", "/api/me/leave", members(422), {
    body: () => ({ confirm: "please" }),
    note: "any member may leave their own group; the invalid body keeps everyone in (leaving.test.ts leaves for real)",
  }),
  row("POST", "members/[userId]/hand-over", `/api/members/${volunteerId}/hand-over`, expects(401, 403, 403, 422, 404), {
    body: () => ({ then: "captain" }),
    note: "the demo volunteer: the other group's organiser gets 404 (member resolved in the acting group), the demo organiser 422 for the body",
  }),
  row("GET", "me/notifications", "/api/me/notifications", members(200)),
  row("PUT", "me/notifications", "/api/me/notifications", members(422), { body: () => ({ runReminder: "off" }) }),
  row("GET", "unsubscribe/[token]", `/api/unsubscribe/${FORGED_TOKEN}`, everyone(404), {
    note: "no session needed (RFC 8058); a token the server did not sign is 404 for everyone, signed ones in notifications.test.ts",
  }),
  row("POST", "unsubscribe/[token]", `/api/unsubscribe/${FORGED_TOKEN}`, everyone(404), {
    note: "one-click POST: the signed token is the credential; a forged one is 404 and changes nothing",
  }),
];
