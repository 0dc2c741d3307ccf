import { beforeEach, describe, expect, it, vi } from "vitest";

const raw = vi.fn();
vi.mock("@/lib/db", () => ({ db: { raw } }));

type Shared = typeof globalThis & { __cantroveNotifyBatches?: unknown; __cantroveBroadcast?: unknown };

// Writes that end while a NOTIFY is on its way share the next one, so a busy
// server sends one per round trip instead of one per write (the bench's
// processing writes lost a third of their throughput to a NOTIFY each).
describe("telling other servers to clear their caches", () => {
  beforeEach(() => {
    delete (globalThis as Shared).__cantroveNotifyBatches;
    delete (globalThis as Shared).__cantroveBroadcast;
    raw.mockReset();
    vi.resetModules();
  });

  it("sends one NOTIFY for the writes that came while one was in flight, after all of them, scope 'all' winning", async () => {
    const sent: { scope: string; finish: () => void }[] = [];
    raw.mockImplementation((_sql: string, [, payload]: [string, string]) => new Promise((resolve) => {
      sent.push({ scope: payload.split("|")[1], finish: () => resolve({ rows: [{ lsn: "0/1" }] }) });
    }));
    const { forgetEverywhere } = await import("@/lib/cache/broadcast");
    const settled: string[] = [];
    const first = forgetEverywhere("data").then(() => settled.push("first"));
    await Promise.resolve();
    expect(sent).toHaveLength(1);
    const later = [forgetEverywhere("data"), forgetEverywhere("all"), forgetEverywhere("data")].map((p, i) => p.then(() => settled.push(`later${i}`)));
    await Promise.resolve();
    expect(sent).toHaveLength(1); // the three wait for the one in flight
    sent[0].finish();
    await first;
    await vi.waitFor(() => expect(sent).toHaveLength(2));
    expect(settled).toEqual(["first"]); // not answered before their own NOTIFY is sent
    expect(sent[1].scope).toBe("all");
    sent[1].finish();
    await Promise.all(later);
    expect(raw).toHaveBeenCalledTimes(2);
    expect(settled.sort()).toEqual(["first", "later0", "later1", "later2"]);
  });

  it("a write after a quiet spell sends its own NOTIFY at once", async () => {
    raw.mockResolvedValue({ rows: [{ lsn: "0/2" }] });
    const { forgetEverywhere } = await import("@/lib/cache/broadcast");
    await forgetEverywhere("all");
    await forgetEverywhere("data");
    expect(raw).toHaveBeenCalledTimes(2);
    expect(raw.mock.calls[1][1][1]).toMatch(/\|data$/);
  });
});
