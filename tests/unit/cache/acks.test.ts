import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";

type Shared = typeof globalThis & { __cantroveAcks?: Map<string, unknown> };

// A write waits for every other server to say it has cleared its cache, but
// never longer than the time given: a hung server must not hold every write.
describe("waiting for the other servers' acknowledgements", () => {
  beforeEach(() => {
    delete (globalThis as Shared).__cantroveAcks;
    vi.resetModules();
    vi.useFakeTimers();
  });
  afterEach(() => vi.useRealTimers());

  it("resolves on the last of the expected acknowledgements, not before", async () => {
    const { awaitAcks, ackReceived, pendingAcks } = await import("@/lib/cache/acks");
    let done = false;
    const p = awaitAcks("m1", 2, 200).then(() => (done = true));
    ackReceived("m1");
    ackReceived("other-message");
    await Promise.resolve();
    expect(done).toBe(false);
    ackReceived("m1");
    await p;
    expect(done).toBe(true);
    expect(pendingAcks()).toBe(0);
  });

  it("gives up after the time given when a server never answers", async () => {
    const { awaitAcks, ackReceived, pendingAcks } = await import("@/lib/cache/acks");
    let done = false;
    const p = awaitAcks("m2", 2, 200).then(() => (done = true));
    ackReceived("m2");
    await vi.advanceTimersByTimeAsync(199);
    expect(done).toBe(false);
    await vi.advanceTimersByTimeAsync(1);
    await p;
    expect(done).toBe(true);
    expect(pendingAcks()).toBe(0);
  });

  it("waits for nothing when no other server listens", async () => {
    const { awaitAcks, pendingAcks } = await import("@/lib/cache/acks");
    await awaitAcks("m3", 0, 200);
    expect(pendingAcks()).toBe(0);
  });

  it("is one set of waiters for every copy of the module (the listener and a route are bundled apart)", async () => {
    const first = await import("@/lib/cache/acks");
    vi.resetModules();
    const second = await import("@/lib/cache/acks");
    let done = false;
    const p = first.awaitAcks("m4", 1, 200).then(() => (done = true));
    second.ackReceived("m4");
    await p;
    expect(done).toBe(true);
  });
});
