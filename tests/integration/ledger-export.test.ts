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
    expect(lines[0].split(",").slice(0, 6)).toEqual(["line", "occurred_at", "occurred_local (Europe/London)", "recorded_at", "recorded_local (Europe/London)", "entry"]);
    expect(lines).toHaveLength(all.length + 1);
    expect(lines.some((l) => l.includes(",rejected,into rejected,2,dented,"))).toBe(true);

    const vol = await g.client("volunteer");
    expect((await vol.get(`/api/ledger/export?driveId=${g.driveId}`)).status).toBe(403);
  });
});

describe("CSV export of the ledger screen", () => {
  it("neutralises a volunteer's =HYPERLINK note (OWASP CSV Injection), names the drive and range, writes local time and words", async () => {
    // A group of its own, so the recycling test's counts below stay as they were.
    const g = await freshGroup("export-csv");
    const vol = await g.client("volunteer");
    const note = '=HYPERLINK("http://evil.example/x","Open me")';
    const haul = await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[1], bags: 1, note, hauledAt: "2026-11-30T23:30:00Z" });
    expect(haul.status).toBe(201);
    await vol.json("POST", `/api/drives/${g.driveId}/sorts`, { haulIds: [(haul.body as { id: string }).id], good: 10, rejected: { wrongSize: 3 } });
    const org = await g.client("organiser");
    const res = await org.get(`/api/ledger/export?driveId=${g.driveId}&from=2026-11-01&to=2026-11-30`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="cantrove-ledger-${g.driveSlug}-2026-11-01-to-2026-11-30.csv"`);
    const text = await res.text();
    // OWASP (owasp.org/www-community/attacks/CSV_Injection): prefix ' and quote the cell.
    expect(text).toContain(`"'=HYPERLINK(""http://evil.example/x"",""Open me"")"`);
    expect(text).not.toMatch(/(^|,)=HYPERLINK/m);
    // 23:30 UTC on 30 Nov is 23:30 in London (GMT in winter; IANA tz database), written as every
    // screen writes a moment (CLDR en-GB medium date, short time).
    expect(text).toContain('2026-11-30T23:30:00.000Z,"30 Nov 2026, 23:30",');
    const all = await (await org.get(`/api/ledger/export?driveId=${g.driveId}`)).text();
    expect(all).toContain(",wrong size,");
    expect(all).not.toMatch(/wrongSize|builtIn/);
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
