import { act, renderHook } from "@testing-library/react";
import { HttpResponse, http } from "msw";
import { describe, expect, it, vi } from "vitest";
import { useOutbox, type SubmitResult } from "@/components/ledger/use-outbox";
import { OUTBOX_STORAGE_KEY } from "@/lib/ledger/browser-queue";
import { mockApi, testQueryClient } from "@/tests/support/query-client";

// The volunteer's queue against a mocked API, with a fake clock: an entry made
// offline at T and sent at T + 60 s carries T; an unusual number asked about by
// the server goes again confirmed, under a new Idempotency-Key.
const URL = "/api/drives/d1/hauls";
let online = false;
let asks = false;
const seen: { key: string | null; body: Record<string, unknown> }[] = [];

mockApi([
  http.post("*/api/drives/d1/hauls", async ({ request }) => {
    if (!online) return HttpResponse.error();
    const body = (await request.json()) as Record<string, unknown>;
    seen.push({ key: request.headers.get("idempotency-key"), body });
    if (asks && body.confirmUnusual !== true) {
      return HttpResponse.json({ error: { code: "conflict", message: "That is 40 bags from a bin that holds 6 bags. Is that right?", confirm: "implausible" } }, { status: 409 });
    }
    return HttpResponse.json({ id: "h1", movementId: "m1", hauledAt: body.happenedAt }, { status: 201 });
  }),
], () => {
  vi.useRealTimers();
  localStorage.removeItem(OUTBOX_STORAGE_KEY);
  seen.length = 0;
  online = false;
  asks = false;
});
const wrapper = () => testQueryClient().wrapper;

describe("the outbox", () => {
  it("sends an entry made offline at T, and sent at T + 60 s, with happenedAt T and the same key on every try", async () => {
    vi.useFakeTimers({ toFake: ["Date"] });
    const T = new Date("2026-12-02T10:00:00Z");
    vi.setSystemTime(T);
    const { result } = renderHook(() => useOutbox(), { wrapper: wrapper() });
    let first: SubmitResult | undefined;
    await act(async () => {
      first = await result.current.submit(URL, { dropPointId: "p1", bags: 2 }, "Haul: 2 bags");
    });
    expect(first?.kind).toBe("queued");
    expect(result.current.items).toHaveLength(1);
    const queuedKey = result.current.items[0]!.key;

    vi.setSystemTime(new Date(T.getTime() + 30_000));
    await act(async () => {
      await result.current.retryNow(); // still offline: a second failed try
    });
    expect(result.current.items[0]).toMatchObject({ key: queuedKey, attempts: 2 });

    vi.setSystemTime(new Date(T.getTime() + 60_000));
    online = true;
    await act(async () => {
      await result.current.retryNow();
    });
    expect(seen).toHaveLength(1);
    expect(seen[0]!.body).toEqual({ dropPointId: "p1", bags: 2, happenedAt: "2026-12-02T10:00:00.000Z" });
    expect(seen[0]!.key).toBe(queuedKey);
    expect(result.current.items).toEqual([]);
  });

  it("asks about an unusual number, and on Yes sends it again confirmed under a new key with the original time", async () => {
    online = true;
    asks = true;
    const { result } = renderHook(() => useOutbox(), { wrapper: wrapper() });
    let asked: SubmitResult | undefined;
    await act(async () => {
      asked = await result.current.submit(URL, { dropPointId: "p1", bags: 40 }, "Haul: 40 bags");
    });
    expect(asked).toMatchObject({ kind: "refused", question: "That is 40 bags from a bin that holds 6 bags. Is that right?" });
    if (asked?.kind !== "refused" || !asked.confirm) throw new Error("no confirm offered");
    let done: SubmitResult | undefined;
    const confirm = asked.confirm;
    await act(async () => {
      done = await confirm();
    });
    expect(done?.kind).toBe("done");
    expect(seen).toHaveLength(2);
    expect(seen[1]!.key).not.toBe(seen[0]!.key);
    expect(seen[1]!.body).toEqual({ ...seen[0]!.body, confirmUnusual: true });
    expect(seen[0]!.body).not.toHaveProperty("confirmUnusual");
  });
});
