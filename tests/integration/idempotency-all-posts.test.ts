import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "@/tests/support/db";
import { freshGroupForFile } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// CONTRACT.md: every POST accepts an Idempotency-Key — a repeat with the same
// key and body returns the first answer and changes nothing; the same key with
// another body is 409. Checked here on POSTs that are not ledger writes.
const g = freshGroupForFile("idem-posts");
let org: ApiClient;
beforeAll(async () => {
  org = await g.client("organiser");
});

const drivesWithSlug = async (slug: string) => Number((await testDb()("drives").where({ group_id: g.groupId, slug }).count({ n: "*" }).first())?.n);
const driveBody = (slug: string) => ({ name: "Idempotent spring drive", slug, startsOn: "2027-03-01", endsOn: "2027-04-30", isPublic: false });

describe("Idempotency-Key on every signed-in POST", () => {
  it("creates one drive for two sends with one key, and answers both alike", async () => {
    const key = randomUUID();
    const slug = `idem-${key.slice(0, 8)}`;
    const first = await org.json<{ id: string }>("POST", "/api/drives", driveBody(slug), { "idempotency-key": key });
    const again = await org.json<{ id: string }>("POST", "/api/drives", driveBody(slug), { "idempotency-key": key });
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    expect(await drivesWithSlug(slug)).toBe(1);
  });

  it("refuses the same key with another body (409) and writes nothing for it", async () => {
    const key = randomUUID();
    const slug = `idem-${key.slice(0, 8)}`;
    expect((await org.json("POST", "/api/drives", driveBody(slug), { "idempotency-key": key })).status).toBe(201);
    const other = await org.json("POST", "/api/drives", driveBody(`${slug}-b`), { "idempotency-key": key });
    expect(other.status).toBe(409);
    expect(await drivesWithSlug(`${slug}-b`)).toBe(0);
  });

  it("keeps a refusal under its key too, and a new key is a new request", async () => {
    const key = randomUUID();
    const bad = { ...driveBody(`idem-${key.slice(0, 8)}`), name: "" };
    const first = await org.json("POST", "/api/drives", bad, { "idempotency-key": key });
    const again = await org.json("POST", "/api/drives", bad, { "idempotency-key": key });
    expect(first.status).toBe(422);
    expect(again.status).toBe(422);
    expect(again.body).toEqual(first.body);
    const fixed = await org.json("POST", "/api/drives", { ...bad, name: "Now named" }, { "idempotency-key": randomUUID() });
    expect(fixed.status).toBe(201);
  });
});
