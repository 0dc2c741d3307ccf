import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomBytes, randomUUID } from "node:crypto";
import { ApiClient } from "@/tests/support/http";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";
import { waitForMail } from "@/tests/support/mail";

// Issue 16: a pledge could not be cancelled by the donor, nor marked received
// or not brought by the organiser. The cancel link in the confirmation mail
// carries an unguessable token; opening it (GET) changes nothing, a POST cancels.
let g: FreshGroup;
let org: ApiClient;
afterAll(closeTestDb);
beforeAll(async () => {
  g = await freshGroup("pledge-life");
  org = await g.client("organiser");
});

type Answer = { id?: string; status?: string; haulId?: string | null; error?: { code: string } };
const pledge = (email = "") =>
  new ApiClient().json<{ id: string; mailed: boolean }>("POST", `/api/public/drives/${g.driveSlug}/pledges`, { dropPointId: g.dropPointIds[0], name: "Ida Fenwick", email, bags: 3, bringOn: "2026-12-12" });
const cancel = (token: string) => new ApiClient().json<Answer>("POST", "/api/public/pledges/cancel", { token });
const mark = (c: ApiClient, id: string, body: object) => c.json<Answer>("POST", `/api/pledges/${id}/status`, body, { "Idempotency-Key": randomUUID() });
const statusOf = async (id: string) => (await testDb()("pledges").where({ id }).first("status")).status as string;

describe("the donor cancels from the mail's link", () => {
  it("needs the token, asks on GET and cancels only on POST, once", async () => {
    const email = `donor-${randomUUID().slice(0, 8)}@example.test`;
    const made = await pledge(email);
    expect(made.status).toBe(201);
    const mail = await waitForMail(email, (m) => m.subject.startsWith("Your pledge"));
    const link = /https?:\/\/\S+\/pledges\/cancel\/([A-Za-z0-9_-]{43})/.exec(mail.text);
    expect(link, mail.text).not.toBeNull();
    const token = link![1];
    // Only the token's hash is stored.
    const row = await testDb()("pledges").where({ id: made.body.id }).first("cancel_token_hash");
    expect(row.cancel_token_hash).not.toContain(token);
    expect(row.cancel_token_hash).toHaveLength(64);

    const page = await new ApiClient().get(`/pledges/cancel/${token}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Yes, cancel my pledge");
    expect(await statusOf(made.body.id)).toBe("pledged");

    // A well-formed token that names no pledge is 404; a malformed one 422.
    expect((await cancel(randomBytes(32).toString("base64url"))).status).toBe(404);
    expect((await cancel("x")).status).toBe(422);
    expect(await statusOf(made.body.id)).toBe("pledged");

    const done = await cancel(token);
    expect(done.status).toBe(200);
    expect(done.body).toEqual({ id: made.body.id, status: "cancelled" });
    expect((await cancel(token)).status).toBe(409);
    // The organiser cannot mark a cancelled pledge.
    expect((await mark(org, made.body.id, { status: "received" })).status).toBe(409);
  });
});

describe("the organiser marks a pledge", () => {
  it("received with the haul that brought it, not brought, and nothing across groups", async () => {
    const a = (await pledge()).body.id;
    const vol = await g.client("volunteer");
    const haul = (await vol.json<{ id: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 3 })).body.id;
    const elsewhere = (await vol.json<{ id: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[1], bags: 1 })).body.id;

    expect((await mark(org, a, { status: "received", haulId: elsewhere })).status).toBe(409);
    // An undone haul brought nothing: it cannot be named (the screen offers only hauls still standing).
    const undone = (await vol.json<{ id: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 2 })).body.id;
    await testDb()("hauls").where({ id: undone }).update({ reversed_at: new Date() });
    expect((await mark(org, a, { status: "received", haulId: undone })).status).toBe(404);
    const got = await mark(org, a, { status: "received", haulId: haul });
    expect(got.status).toBe(200);
    expect(got.body).toMatchObject({ id: a, status: "received", haulId: haul });
    expect((await mark(org, a, { status: "notBrought", haulId: haul })).status).toBe(409);
    expect((await mark(org, a, { status: "notBrought" })).body).toMatchObject({ status: "notBrought", haulId: null });
    expect((await mark(vol, a, { status: "received" })).status).toBe(403);

    const other = await (await freshGroup("pledge-other")).client("organiser");
    expect((await mark(other, a, { status: "received" })).status).toBe(404);
    expect(await statusOf(a)).toBe("notBrought");
    // The other group's haul is 404 too.
    const b = (await pledge()).body.id;
    const og = await freshGroup("pledge-other-haul");
    const theirHaul = (await (await og.client("volunteer")).json<{ id: string }>("POST", `/api/drives/${og.driveId}/hauls`, { dropPointId: og.dropPointIds[0], bags: 1 })).body.id;
    expect((await mark(org, b, { status: "received", haulId: theirHaul })).status).toBe(404);
    expect(await statusOf(b)).toBe("pledged");
  });
});
