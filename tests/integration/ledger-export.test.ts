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
