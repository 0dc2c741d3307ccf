import { describe, expect, it } from "vitest";
import { addToOutbox, classify, markAttempt, readOutbox, removeFromOutbox, type OutboxItem } from "@/lib/ledger/outbox";

function memory() {
  const m = new Map<string, string>();
  return { getItem: (k: string) => m.get(k) ?? null, setItem: (k: string, v: string) => void m.set(k, v) };
}
const item = (key: string): OutboxItem => ({ key, url: "/api/x", body: { a: 1 }, label: key, createdAt: "2026-12-02T00:00:00Z", attempts: 0 });

describe("outbox", () => {
  it("keeps entries in order, with their keys, until removed", () => {
    const s = memory();
    addToOutbox(s, item("a"));
    addToOutbox(s, item("b"));
    markAttempt(s, "a", "No connection");
    expect(readOutbox(s).map((i) => [i.key, i.attempts])).toEqual([["a", 1], ["b", 0]]);
    removeFromOutbox(s, "a");
    expect(readOutbox(s).map((i) => i.key)).toEqual(["b"]);
  });

  it("survives garbage in storage", () => {
    const s = memory();
    s.setItem("cantrove.outbox.v1", "{not json");
    expect(readOutbox(s)).toEqual([]);
  });

  it("retries network failures, 5xx, 408 and 429, and stops on other answers", () => {
    // RFC 9110 §15: 4xx are client errors a repeat will not fix, except 408 (timeout); 429 is RFC 6585's "try later".
    expect(classify(null, null, "Failed to fetch").kind).toBe("retry");
    expect(classify(503, null).kind).toBe("retry");
    expect(classify(408, null).kind).toBe("retry");
    expect(classify(429, null).kind).toBe("retry");
    expect(classify(201, { id: 1 })).toEqual({ kind: "done", status: 201, body: { id: 1 } });
    expect(classify(409, { error: { message: "only 3 left" } })).toEqual({ kind: "refused", status: 409, message: "only 3 left" });
  });
});
