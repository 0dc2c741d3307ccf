import { describe, expect, it, vi } from "vitest";

vi.mock("@/lib/db", () => ({ db: { raw: vi.fn() } }));

type Shared = typeof globalThis & { __cantroveEchoes?: Map<string, () => void>; __cantroveBroadcast?: unknown };

// The built server loads lib/cache/broadcast.ts once per route bundle, and the
// listener (started by instrumentation.ts) runs in another copy than the route
// that wrote. A write's wait for its own NOTIFY is found by the listener only if
// both copies see one map of waiters; with one map per copy every write waited
// the whole 200 ms (seen in `npm run bench`: processing p50 207 ms).
describe("the NOTIFY echo waiters", () => {
  it("are one map for every copy of the module", async () => {
    const shared = globalThis as Shared;
    delete shared.__cantroveEchoes;
    await import("@/lib/cache/broadcast");
    const first = shared.__cantroveEchoes;
    expect(first).toBeInstanceOf(Map);
    vi.resetModules();
    await import("@/lib/cache/broadcast");
    expect(shared.__cantroveEchoes).toBe(first);
  });
});
