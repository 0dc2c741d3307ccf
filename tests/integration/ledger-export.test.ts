import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb } from "@/tests/support/db";
import { freshGroup, haulAndSort, type FreshGroup } from "@/tests/support/ledger";

let g: FreshGroup;
beforeAll(async () => {
  g = await freshGroup("export");
  await haulAndSort(await g.client("volunteer"), g.driveId, g.dropPointIds[0], 40, { dented: 2 });
});
afterAll(closeTestDb);

describe("ledger table and CSV export", () => {
  it("filters in SQL and exports the same lines as RFC 4180 CSV", async () => {
    const org = await g.client("organiser");
    const rows = (await org.json<{ id: string; to: string | null; quantity: number }[]>("GET", `/api/ledger?driveId=${g.driveId}&stage=rejected`)).body;
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ to: "rejected", quantity: 2 });

    const all = (await org.json<unknown[]>("GET", `/api/ledger?driveId=${g.driveId}`)).body;
    const res = await org.get(`/api/ledger/export?driveId=${g.driveId}`);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    const text = await res.text();
    // RFC 4180: one header line, then one line per record, CRLF or LF separated (no field here holds a newline).
    const lines = text.trim().split(/\r?\n/);
    expect(lines[0].split(",").slice(0, 4)).toEqual(["line", "occurred_at", "recorded_at", "entry"]);
    expect(lines).toHaveLength(all.length + 1);
    expect(lines.some((l) => l.includes(",rejected,2,dented,"))).toBe(true);

    const vol = await g.client("volunteer");
    expect((await vol.get(`/api/ledger/export?driveId=${g.driveId}`)).status).toBe(403);
  });
});

describe("rejects taken to recycling", () => {
  it("moves rejected cans to recycled, keeps weight and money, and refuses more than are waiting", async () => {
    const vol = await g.client("volunteer");
    const before = (await vol.json<{ rejectedOnHand: number; stages: { recycled: number } }>("GET", `/api/drives/${g.driveId}/stock`)).body;
    expect(before.rejectedOnHand).toBe(2);
    const ok = await vol.json<{ movementId: string; weightKg: number; moneyReceived: number }>("POST", `/api/drives/${g.driveId}/recycling`, { quantity: 1, weightKg: 0.015, moneyReceived: 0.02 });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ weightKg: 0.015, moneyReceived: 0.02 });
    const more = await vol.json<{ error: { message: string } }>("POST", `/api/drives/${g.driveId}/recycling`, { quantity: 2 });
    expect(more.status).toBe(409);
    expect(more.body.error.message).toMatch(/only 1 left/);
    const after = (await vol.json<{ rejectedOnHand: number; stages: { recycled: number }; rejected: { dented: number } }>("GET", `/api/drives/${g.driveId}/stock`)).body;
    expect(after).toMatchObject({ rejectedOnHand: 1, stages: { recycled: 1 }, rejected: { dented: 2 } });
  });
});
