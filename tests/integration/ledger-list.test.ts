import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeTestDb, testDb } from "@/tests/support/db";
import { freshGroup, type FreshGroup } from "@/tests/support/ledger";

// The ledger screen's list (issue 13): ordered by when it happened, then by
// line; 500 a page with a cursor; the first page counts the lines up to 1,000
// (issue 18: no exact recount on every view); undo links both ways.
let g: FreshGroup;
let actorId: string;
beforeAll(async () => {
  g = await freshGroup("list");
  actorId = (await testDb()("users").where({ email: g.emails.volunteer }).first()).id;
});
afterAll(closeTestDb);

/** One movement of `n` one-can lines into hauled, through the ledger's own posting function. */
async function postLines(n: number, occurredAt: string) {
  const lines = Array.from({ length: n }, () => ({ from: null, to: "hauled", quantity: 1, dropPointId: g.dropPointIds[0], isEstimate: true, note: "bulk" }));
  const p = { groupId: g.groupId, driveId: g.driveId, actorId, kind: "haul", occurredAt, day: occurredAt.slice(0, 10), details: {}, lines };
  await testDb().raw("select ledger_post(?::jsonb)", [JSON.stringify(p)]);
}

type Row = { id: string; occurredAt: string; reversesId: string | null; reversedById: string | null; reversalReason: string | null; note: string; movementId: string };

describe("GET /api/ledger", () => {
  it("orders by when it happened, then line, and pages past 500 with a cursor; the first page has the total", async () => {
    await postLines(300, "2026-11-10T10:00:00.000Z");
    // Logged afterwards (higher line numbers) but happened earlier: must come after the first 300.
    await postLines(300, "2026-11-05T10:00:00.000Z");
    const org = await g.client("organiser");
    const first = await org.get(`/api/ledger?driveId=${g.driveId}`);
    expect(first.status).toBe(200);
    expect(first.headers.get("x-total-count")).toBe("600");
    const page1 = (await first.json()) as Row[];
    expect(page1).toHaveLength(500);
    const cursor = first.headers.get("x-next-cursor");
    expect(cursor).toBe(page1[499].id);
    const second = await org.get(`/api/ledger?driveId=${g.driveId}&cursor=${cursor}`);
    // Later pages count nothing: the screen keeps the first page's count.
    expect(second.headers.get("x-total-count")).toBeNull();
    expect(second.headers.get("x-total-over")).toBeNull();
    expect(second.headers.get("x-next-cursor")).toBeNull();
    const page2 = (await second.json()) as Row[];
    expect(page2).toHaveLength(100);

    const all = [...page1, ...page2];
    expect(new Set(all.map((r) => r.id)).size).toBe(600);
    expect(all.slice(0, 300).every((r) => r.occurredAt === "2026-11-10T10:00:00.000Z")).toBe(true);
    for (let i = 1; i < all.length; i++) {
      const [a, b] = [all[i - 1], all[i]];
      const ordered = a.occurredAt > b.occurredAt || (a.occurredAt === b.occurredAt && BigInt(a.id) > BigInt(b.id));
      expect(ordered, `line ${a.id} before line ${b.id}`).toBe(true);
    }
    // The body is still the contract's array; filters and the day range still apply.
    const day = await org.get(`/api/ledger?driveId=${g.driveId}&from=2026-11-05&to=2026-11-05`);
    expect(day.headers.get("x-total-count")).toBe("300");
    expect(day.headers.get("x-total-over")).toBeNull();
  });

  it("past 1,000 matching lines the first page says 'more than 1,000', not an exact count; exactly 1,000 is exact", async () => {
    // With the 600 lines of the test above: 1,300 on the drive, 1,000 from the 1st to the 5th of November.
    await postLines(350, "2026-11-01T10:00:00.000Z");
    await postLines(350, "2026-11-01T11:00:00.000Z");
    const org = await g.client("organiser");
    const first = await org.get(`/api/ledger?driveId=${g.driveId}&limit=50`);
    expect(first.status).toBe(200);
    expect(first.headers.get("x-total-count")).toBeNull();
    expect(first.headers.get("x-total-over")).toBe("1000");
    expect((await first.json()) as Row[]).toHaveLength(50);
    expect(first.headers.get("x-next-cursor")).not.toBeNull();
    // Filters narrow the count back under the cap, and it is exact again.
    const day = await org.get(`/api/ledger?driveId=${g.driveId}&from=2026-11-01&to=2026-11-01&limit=50`);
    expect(day.headers.get("x-total-count")).toBe("700");
    expect(day.headers.get("x-total-over")).toBeNull();
    const atCap = await org.get(`/api/ledger?driveId=${g.driveId}&to=2026-11-05&limit=50`);
    expect(atCap.headers.get("x-total-count")).toBe("1000");
    expect(atCap.headers.get("x-total-over")).toBeNull();
  });

  it("an organiser undoes a volunteer's entry with a reason; both lines name each other; no body still works", async () => {
    const vol = await g.client("volunteer");
    const haul = await vol.json<{ movementId: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[1], bags: 1, hauledAt: "2026-11-20T09:00:00Z" });
    expect(haul.status).toBe(201);
    const org = await g.client("organiser");
    const undo = await org.json<{ reason: string }>("POST", `/api/movements/${haul.body.movementId}/reversal`, { reason: "Logged at the wrong bin" });
    expect(undo.status).toBe(201);
    expect(undo.body.reason).toBe("Logged at the wrong bin");

    const rows = (await org.json<Row[]>("GET", `/api/ledger?driveId=${g.driveId}&dropPointId=${g.dropPointIds[1]}`)).body;
    const original = rows.find((r) => r.movementId === haul.body.movementId)!;
    const reversal = rows.find((r) => r.reversesId === original.id)!;
    expect(original.reversedById).toBe(reversal.id);
    expect(reversal.reversalReason).toBe("Logged at the wrong bin");
    const stored = await testDb()("movements").where({ reverses_movement_id: haul.body.movementId }).first();
    expect(stored.details).toMatchObject({ reason: "Logged at the wrong bin" });

    const second = await vol.json<{ movementId: string }>("POST", `/api/drives/${g.driveId}/hauls`, { dropPointId: g.dropPointIds[1], bags: 1 });
    const bare = await org.post(`/api/movements/${second.body.movementId}/reversal`);
    expect(bare.status).toBe(201);
    expect(((await bare.json()) as { reason: string | null }).reason).toBeNull();
    const tooLong = await org.json("POST", `/api/movements/${haul.body.movementId}/reversal`, { reason: "x".repeat(301) });
    expect(tooLong.status).toBe(422);
  });
});
