import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "@/tests/support/db";
import { freshGroupForFile } from "@/tests/support/ledger";
import type { ApiClient } from "@/tests/support/http";

// An entry made offline at T and sent later is recorded at T (happenedAt), within
// bounds: not more than 5 minutes ahead of the server, not before the drive started.
const g = freshGroupForFile("entry-time");
let vol: ApiClient;
type Line = { movementId: string; occurredAt: string; recordedAt: string };

beforeAll(async () => {
  vol = await g.client("volunteer");
});

describe("happenedAt", () => {
  it("records a haul, a sort and a processing step entered at T and sent at T + 60 s at T", async () => {
    const T = new Date(Date.now() - 60_000).toISOString();
    const haul = await vol.json<{ id: string; movementId: string; hauledAt: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 2, happenedAt: T });
    expect(haul.status).toBe(201);
    expect(haul.body.hauledAt).toBe(T);
    const sort = await vol.json<{ movementId: string; sortedAt: string }>("POST", `/api/drives/${g.driveId}/sorts`, { haulIds: [haul.body.id], good: 100, happenedAt: T });
    expect(sort.status).toBe(201);
    expect(sort.body.sortedAt).toBe(T);
    const wash = await vol.json<{ movementId: string; occurredAt: string }>("POST", `/api/drives/${g.driveId}/processing`, { from: "good", to: "washed", quantity: 10, happenedAt: T });
    expect(wash.status).toBe(201);
    expect(wash.body.occurredAt).toBe(T);

    const db = testDb();
    for (const id of [haul.body.movementId, sort.body.movementId, wash.body.movementId]) {
      const m = await db("movements").where({ id }).first();
      expect(new Date(m.occurred_at).toISOString()).toBe(T);
      // Received now, a minute after it happened.
      expect(new Date(m.recorded_at).getTime() - Date.parse(T)).toBeGreaterThanOrEqual(59_000);
    }
    // The ledger screen's rows (an organiser's) carry both times.
    const org = await g.client("organiser");
    const lines = (await org.json<Line[]>("GET", `/api/ledger?driveId=${g.driveId}`)).body;
    const washLine = lines.find((l) => l.movementId === wash.body.movementId)!;
    expect(washLine.occurredAt).toBe(T);
    expect(Date.parse(washLine.recordedAt) - Date.parse(T)).toBeGreaterThanOrEqual(59_000);
  });

  it("refuses a time in the future beyond 5 minutes, or before the drive started, on the happenedAt field", async () => {
    const future = new Date(Date.now() + 10 * 60_000).toISOString();
    const ahead = await vol.json<{ error: { code: string; fields: Record<string, string> } }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 1, happenedAt: future });
    expect(ahead.status).toBe(422);
    expect(ahead.body.error.fields.happenedAt).toMatch(/in the future/);
    // freshGroup's drive starts on 2026-11-01.
    const early = await vol.json<{ error: { fields: Record<string, string> } }>("POST", `/api/drives/${g.driveId}/processing`, { from: "good", to: "washed", quantity: 1, happenedAt: "2026-10-20T12:00:00Z" });
    expect(early.status).toBe(422);
    expect(early.body.error.fields.happenedAt).toMatch(/before the drive started \(2026-11-01\)/);
    // A phone a couple of minutes fast is fine.
    const skew = await vol.json("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[0], bags: 1, happenedAt: new Date(Date.now() + 120_000).toISOString() });
    expect(skew.status).toBe(201);
  });
});
