import "fake-indexeddb/auto";
import { act, renderHook, waitFor } from "@testing-library/react";
import { HttpResponse, http } from "msw";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { useOutbox, type SubmitResult } from "@/components/ledger/use-outbox";
import { PersonProvider } from "@/components/offline/person-context";
import { entriesOf, forgetPersonEntries, putEntry } from "@/lib/offline/store";
import { mockApi, testQueryClient } from "@/tests/support/query-client";
import type { ReactNode } from "react";

// The volunteer's queue (IndexedDB, here fake-indexeddb) against a mocked API,
// with a fake clock: an entry made offline at T and sent at T + 60 s carries T;
// an unusual number asked about by the server goes again confirmed, under a new
// Idempotency-Key; entries go oldest first, each with its owner, and another
// person's entries are never sent or shown.
const URL = "/api/drives/d1/hauls";
let online = false;
let asks = false;
let refuseWith: string | null = null;
const seen: { key: string | null; by: string | null; body: Record<string, unknown> }[] = [];

mockApi([
  http.post("*/api/drives/d1/hauls", async ({ request }) => {
    if (!online) return HttpResponse.error();
    const body = (await request.json()) as Record<string, unknown>;
    seen.push({ key: request.headers.get("idempotency-key"), by: request.headers.get("x-cantrove-entered-by"), body });
    if (refuseWith) return HttpResponse.json({ error: { code: "invalid_input", message: refuseWith } }, { status: 422 });
    if (asks && body.confirmUnusual !== true) {
      return HttpResponse.json({ error: { code: "conflict", message: "That is 40 bags from a bin that holds 6 bags. Is that right?", confirm: "implausible" } }, { status: 409 });
    }
    return HttpResponse.json({ id: "h1", movementId: "m1", hauledAt: body.happenedAt }, { status: 201 });
  }),
], () => {
  vi.useRealTimers();
  seen.length = 0;
  online = false;
  asks = false;
  refuseWith = null;
});
const wrapper = (person = "u1", group = "g1") => {
  const Query = testQueryClient().wrapper;
  function SignedIn({ children }: { children: ReactNode }) {
    return (
      <Query>
        <PersonProvider value={{ id: person, group }}>{children}</PersonProvider>
      </Query>
    );
  }
  return SignedIn;
};

beforeEach(async () => {
  await forgetPersonEntries("u1");
  await forgetPersonEntries("u2");
});

describe("the outbox", () => {
  it("sends an entry made offline at T, and sent at T + 60 s, with happenedAt T and the same key on every try", async () => {
    vi.useFakeTimers({ toFake: ["Date"] });
    const T = new Date("2026-12-02T10:00:00Z");
    vi.setSystemTime(T);
    const { result } = renderHook(() => useOutbox(), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.ready).toBe(true));
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
    expect(seen[0]!.by).toBe("u1");
    expect(result.current.items).toEqual([]);
    expect(await entriesOf("u1")).toEqual([]);
  });

  it("keeps entries in IndexedDB across a reload of the page and sends them oldest first", async () => {
    const first = renderHook(() => useOutbox(), { wrapper: wrapper() });
    await waitFor(() => expect(first.result.current.ready).toBe(true));
    await act(async () => {
      await first.result.current.submit(URL, { dropPointId: "p1", bags: 1 }, "Haul: 1 bag");
      await first.result.current.submit(URL, { dropPointId: "p1", bags: 2 }, "Haul: 2 bags");
      await first.result.current.submit(URL, { dropPointId: "p1", bags: 3 }, "Haul: 3 bags");
    });
    first.unmount(); // the page is closed
    expect((await entriesOf("u1")).map((e) => e.label)).toEqual(["Haul: 1 bag", "Haul: 2 bags", "Haul: 3 bags"]);
    online = true;
    const second = renderHook(() => useOutbox(), { wrapper: wrapper() });
    await waitFor(() => expect(second.result.current.ready).toBe(true));
    await waitFor(() => expect(seen).toHaveLength(3));
    expect(seen.map((s) => s.body.bags)).toEqual([1, 2, 3]);
    await waitFor(() => expect(second.result.current.items).toEqual([]));
  });

  it("never sends or shows another person's waiting entries", async () => {
    await putEntry({ key: "k-other", url: URL, body: { dropPointId: "p1", bags: 9 }, label: "Haul: 9 bags", createdAt: "2026-12-02T09:00:00.000Z", attempts: 0, owner: "u2", state: "waiting" });
    online = true;
    const { result } = renderHook(() => useOutbox(), { wrapper: wrapper("u1") });
    await waitFor(() => expect(result.current.ready).toBe(true));
    await act(async () => {
      await result.current.retryNow();
    });
    expect(result.current.items).toEqual([]);
    expect(seen).toEqual([]);
    expect(await entriesOf("u2")).toHaveLength(1);
  });

  it("shows and sends a person's entry only in the group it was entered in, and sends it once they are back in it", async () => {
    const inA = renderHook(() => useOutbox(), { wrapper: wrapper("u1", "g1") });
    await waitFor(() => expect(inA.result.current.ready).toBe(true));
    await act(async () => {
      await inA.result.current.submit(URL, { dropPointId: "p1", bags: 4 }, "Haul: 4 bags");
    });
    inA.unmount();
    online = true;
    // Switched to another group: the entry is neither listed nor sent there.
    const inB = renderHook(() => useOutbox(), { wrapper: wrapper("u1", "g2") });
    await waitFor(() => expect(inB.result.current.ready).toBe(true));
    await act(async () => {
      await inB.result.current.retryNow();
    });
    expect(inB.result.current.items).toEqual([]);
    expect(seen).toEqual([]);
    inB.unmount();
    const back = renderHook(() => useOutbox(), { wrapper: wrapper("u1", "g1") });
    await waitFor(() => expect(seen).toHaveLength(1));
    expect(seen[0]!.body.bags).toBe(4);
    await waitFor(() => expect(back.result.current.items).toEqual([]));
  });

  it("keeps an entry the server refused after it waited, with the server's reason, until it is dropped", async () => {
    const first = renderHook(() => useOutbox(), { wrapper: wrapper() });
    await waitFor(() => expect(first.result.current.ready).toBe(true));
    await act(async () => {
      await first.result.current.submit(URL, { dropPointId: "p1", bags: 2 }, "Haul: 2 bags");
    });
    first.unmount();
    online = true;
    refuseWith = "That drive has ended.";
    const { result } = renderHook(() => useOutbox(), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.ready).toBe(true));
    await waitFor(() => expect(result.current.refusals).toHaveLength(1));
    expect(result.current.refusals[0]).toMatchObject({ label: "Haul: 2 bags", message: "That drive has ended." });
    expect(result.current.items).toEqual([]);
    await act(async () => {
      result.current.dismissRefusal(result.current.refusals[0]!.key);
    });
    await waitFor(() => expect(result.current.refusals).toEqual([]));
    expect(await entriesOf("u1")).toEqual([]);
  });

  it("asks about an unusual number, and on Yes sends it again confirmed under a new key with the original time", async () => {
    online = true;
    asks = true;
    const { result } = renderHook(() => useOutbox(), { wrapper: wrapper() });
    await waitFor(() => expect(result.current.ready).toBe(true));
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
