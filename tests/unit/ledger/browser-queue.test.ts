import { describe, expect, it } from "vitest";
import { addToOutbox, attemptsText, classify, confirmedCopy, markAttempt, newOutboxItem, readOutbox, removeFromOutbox, type OutboxItem } from "@/lib/ledger/browser-queue";

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
    expect(classify(null, null, "Failed to fetch")).toEqual({ kind: "retry", message: "no connection yet" });
    expect(classify(503, null)).toEqual({ kind: "retry", message: "the server did not answer" });
    // The waiting list says it in words, never the browser's "Failed to fetch".
    expect(attemptsText(4, "Failed to fetch")).toBe("Tried 4 times, no connection yet. It is sent by itself once it can be.");
    expect(attemptsText(1, "the server did not answer")).toBe("Tried 1 time, the server did not answer. It is sent by itself once it can be.");
    expect(classify(503, null).kind).toBe("retry");
    expect(classify(408, null).kind).toBe("retry");
    expect(classify(429, null).kind).toBe("retry");
    expect(classify(201, { id: 1 })).toEqual({ kind: "done", status: 201, body: { id: 1 } });
    expect(classify(409, { error: { message: "only 3 left" } })).toEqual({ kind: "refused", status: 409, message: "only 3 left" });
  });
});

describe("entry time and confirmation", () => {
  it("stamps a new entry with the time it was entered, once, in its body", () => {
    const entered = new Date("2026-12-02T10:00:00Z");
    const i = newOutboxItem("/api/drives/d/hauls", { bags: 2 }, "Haul", entered, "k1");
    expect(i).toMatchObject({ key: "k1", createdAt: "2026-12-02T10:00:00.000Z", attempts: 0, body: { bags: 2, happenedAt: "2026-12-02T10:00:00.000Z" } });
    // A time the form set itself wins.
    expect(newOutboxItem("/x", { happenedAt: "2026-12-01T09:00:00Z" }, "x", entered, "k2").body).toEqual({ happenedAt: "2026-12-01T09:00:00Z" });
  });

  it("resends a confirmed entry under a new key, with the time it was first entered", () => {
    const first = newOutboxItem("/api/drives/d/sorts", { haulIds: ["h"], good: 1_000_000 }, "Sort", new Date("2026-12-02T10:00:00Z"), "old");
    const again = confirmedCopy({ ...first, attempts: 2, lastError: "x" }, "new");
    expect(again.key).toBe("new");
    expect(again.body).toEqual({ haulIds: ["h"], good: 1_000_000, happenedAt: "2026-12-02T10:00:00.000Z", confirmUnusual: true });
    expect(again.attempts).toBe(0);
    expect(first.body).not.toHaveProperty("confirmUnusual");
  });

  it("turns the server's question into one the form can ask", () => {
    const question = "That is 1,000,000 cans from 1 bag (about 60 expected). Is that right?";
    const asked = classify(409, { error: { code: "conflict", message: question, confirm: "implausible" } });
    expect(asked).toMatchObject({ kind: "refused", status: 409, question });
    expect(classify(409, { error: { code: "conflict", message: "Only 3 left." } })).not.toHaveProperty("question");
    expect(classify(422, { error: { code: "invalid_input", message: "m", fields: { happenedAt: "future" } } })).toMatchObject({ fields: { happenedAt: "future" } });
  });
});
