import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "@/tests/support/db";
import { freshGroupForFile } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// An entry that waited on a shared phone names who typed it (X-Cantrove-Entered-By,
// lib/offline/send.ts). Replayed while someone else is signed in, it is refused
// before anything is written, so it is never filed under the new person's name.
const g = freshGroupForFile("entered-by");
let vol: ApiClient;
let org: ApiClient;
let volId: string;
let orgId: string;

beforeAll(async () => {
  vol = await g.client("volunteer");
  org = await g.client("organiser");
  volId = (await vol.json<{ user: { id: string } }>("GET", "/api/me")).body.user.id;
  orgId = (await org.json<{ user: { id: string } }>("GET", "/api/me")).body.user.id;
});

describe("X-Cantrove-Entered-By", () => {
  it("records the entry for the person who typed it", async () => {
    const res = await vol.json<{ movementId: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 2 }, { "idempotency-key": crypto.randomUUID(), "x-cantrove-entered-by": volId });
    expect(res.status).toBe(201);
  });

  it("refuses (409) the volunteer's queued haul and sort when the organiser is the one signed in, and writes nothing", async () => {
    const db = testDb();
    const before = await db("movements").where({ group_id: g.groupId }).count<{ count: string }[]>("id as count");
    const headers = { "idempotency-key": crypto.randomUUID(), "x-cantrove-entered-by": volId };
    const haul = await org.json<{ error: { code: string; message: string } }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 3 }, headers);
    expect(haul.status).toBe(409);
    expect(haul.body.error.message).toMatch(/someone else/);
    const sort = await org.json("POST", `/api/drives/${g.driveId}/sorts`, { haulIds: [], good: 5 }, { ...headers, "idempotency-key": crypto.randomUUID() });
    expect(sort.status).toBe(409);
    const after = await db("movements").where({ group_id: g.groupId }).count<{ count: string }[]>("id as count");
    expect(after[0]!.count).toBe(before[0]!.count);
    // And the same key sent again by the right person still goes through: nothing was stored under it.
    const right = await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 3 }, { ...headers, "x-cantrove-entered-by": volId });
    expect(right.status).toBe(201);
    expect(orgId).not.toBe(volId);
  });
});
