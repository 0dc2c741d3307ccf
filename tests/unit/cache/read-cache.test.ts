import { describe, expect, it } from "vitest";
import { cachedRead, forgetReads } from "@/lib/cache/read-cache";

// The short read cache's promises: one load for a crowd, nothing stale kept
// after a write, refusals not remembered, and the two spaces cleared apart.
const deferred = <T>() => {
  let resolve!: (v: T) => void;
  const promise = new Promise<T>((r) => (resolve = r));
  return { promise, resolve };
};

describe("short read cache", () => {
  it("answers a crowd of concurrent reads with one load", async () => {
    let loads = 0;
    const gate = deferred<number>();
    const load = () => {
      loads += 1;
      return gate.promise;
    };
    const reads = Array.from({ length: 20 }, () => cachedRead("crowd", load));
    gate.resolve(42);
    expect(await Promise.all(reads)).toEqual(Array(20).fill(42));
    expect(await cachedRead("crowd", load)).toBe(42);
    expect(loads).toBe(1);
  });

  it("does not keep an answer that a write overtook, and reads again after the write", async () => {
    let value = "before";
    const gate = deferred<void>();
    const slow = async () => {
      const seen = value;
      await gate.promise;
      return seen;
    };
    const inFlight = cachedRead("overtaken", slow);
    value = "after";
    forgetReads();
    gate.resolve();
    expect(await inFlight).toBe("after");
    expect(await cachedRead("overtaken", async () => value)).toBe("after");
  });

  it("does not remember a refusal", async () => {
    let calls = 0;
    const failing = async () => {
      calls += 1;
      throw new Error("no such drive");
    };
    await expect(cachedRead("missing", failing)).rejects.toThrow("no such drive");
    await expect(cachedRead("missing", failing)).rejects.toThrow("no such drive");
    expect(calls).toBe(2);
  });

  it("keeps people when only data is forgotten, and forgets both after any other write", async () => {
    let version = 1;
    const read = (space: "people" | "data") => cachedRead(`v-${space}`, async () => version, space);
    expect([await read("people"), await read("data")]).toEqual([1, 1]);
    version = 2;
    forgetReads("data");
    expect([await read("people"), await read("data")]).toEqual([1, 2]);
    version = 3;
    forgetReads();
    expect([await read("people"), await read("data")]).toEqual([3, 3]);
  });
});
