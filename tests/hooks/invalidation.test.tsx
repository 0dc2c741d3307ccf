import { useQuery } from "@tanstack/react-query";
import { act, renderHook, waitFor } from "@testing-library/react";
import { HttpResponse, http } from "msw";
import { describe, expect, it } from "vitest";
import { heaterKeys, useMoveHeater } from "@/hooks/queries/heaters";
import { ledgerKeys, ledgerQueries, useUndoMovement } from "@/hooks/queries/ledger";
import { memberKeys, useRevokeInvitation } from "@/hooks/queries/members";
import { runKeys, useUnskipStop } from "@/hooks/queries/runs";
import type { DriveStock } from "@/lib/ledger/types";
import { mockApi, testQueryClient } from "@/tests/support/query-client";

// Each mutation hook owns its invalidation: after a write, the reads of its
// own domain (and only the domains the write touches) are marked stale, and a
// mounted read is fetched again. Components never invalidate anything.
const DRIVE = "d1";
let stockCalls = 0;
let goodCans = 100;
const undone: { movementId: string; key: string | null; body: unknown }[] = [];

const server = mockApi([
  http.get(`*/api/drives/${DRIVE}/stock`, () => {
    stockCalls += 1;
    return HttpResponse.json({ stages: { sorted: goodCans }, rejectedOnHand: 0, unclaimed: goodCans } as unknown as DriveStock);
  }),
  http.post("*/api/movements/:id/reversal", async ({ params, request }) => {
    const text = await request.text();
    undone.push({ movementId: String(params.id), key: request.headers.get("idempotency-key"), body: text ? JSON.parse(text) : null });
    goodCans -= 10;
    return HttpResponse.json({ movementId: "r1" }, { status: 201 });
  }),
  http.post("*/api/heaters/:id/state", () => HttpResponse.json({ id: "u1", name: "Unit", cans: 120, state: "building", released: 0 })),
  http.delete("*/api/invitations/:id", () => HttpResponse.json({ revoked: true })),
  http.post("*/api/runs/:runId/stops/:stopId/unskip", ({ params }) => HttpResponse.json({ id: params.runId, state: "under_way", stopList: [] })),
], () => {
  stockCalls = 0;
  goodCans = 100;
  undone.length = 0;
});

function setup() {
  const { client, wrapper } = testQueryClient({ staleTime: Infinity });
  // Reads of every domain, cached but not mounted: invalidation marks them without fetching.
  const seeded = {
    ledgerMine: ledgerKeys.mine(),
    ledgerHauls: ledgerKeys.openHauls(DRIVE),
    ledgerList: ledgerKeys.list({ driveId: DRIVE }),
    heaters: heaterKeys.list(),
    invitations: memberKeys.invitations(),
    members: memberKeys.list(),
    run: runKeys.detail("run1"),
    runs: runKeys.list(),
    route: runKeys.route({ start: { lat: 51.5, lng: -0.1 }, stops: [{ id: "p1", lat: 51.51, lng: -0.11 }], returnToStart: false }),
  };
  for (const key of Object.values(seeded)) client.setQueryData(key, []);
  const stale = () => Object.fromEntries(Object.entries(seeded).map(([name, key]) => [name, client.getQueryState(key)?.isInvalidated ?? false]));
  return { client, wrapper, stale };
}

describe("mutation hooks invalidate their own domain's keys", () => {
  it("an undo refreshes every ledger read (a mounted one is fetched again) and leaves the other domains alone", async () => {
    const { wrapper, stale } = setup();
    const { result } = renderHook(() => ({ stock: useQuery(ledgerQueries.stock(DRIVE)), undo: useUndoMovement() }), { wrapper });
    await waitFor(() => expect(result.current.stock.data?.unclaimed).toBe(100));
    expect(stockCalls).toBe(1);

    await act(() => result.current.undo.mutateAsync({ movementId: "m1" }));
    await waitFor(() => expect(result.current.stock.data?.unclaimed).toBe(90));
    expect(stockCalls).toBe(2);
    // Without a reason and a key of its own, the undo is keyed by its movement (a second click is the same undo).
    expect(undone).toEqual([{ movementId: "m1", key: "undo-m1", body: null }]);
    expect(stale()).toEqual({ ledgerMine: true, ledgerHauls: true, ledgerList: true, heaters: false, invitations: false, members: false, run: false, runs: false, route: false });
  });

  it("a refused undo refreshes nothing", async () => {
    server.use(http.post("*/api/movements/:id/reversal", () => HttpResponse.json({ error: { code: "conflict", message: "Already undone." } }, { status: 409 })));
    const { wrapper, stale } = setup();
    const { result } = renderHook(() => useUndoMovement(), { wrapper });
    await act(async () => {
      await expect(result.current.mutateAsync({ movementId: "m1", reason: "typo", idempotencyKey: "k1" })).rejects.toMatchObject({ status: 409 });
    });
    expect(Object.values(stale()).some(Boolean)).toBe(false);
  });

  it("a heater's state move refreshes the heaters and the ledger (installing gives claims back), nothing else", async () => {
    const { wrapper, stale } = setup();
    const { result } = renderHook(() => useMoveHeater("u1"), { wrapper });
    await act(() => result.current.mutateAsync("building"));
    expect(stale()).toEqual({ ledgerMine: true, ledgerHauls: true, ledgerList: true, heaters: true, invitations: false, members: false, run: false, runs: false, route: false });
  });

  it("revoking an invitation refreshes the invitations only, not the member list", async () => {
    const { wrapper, stale } = setup();
    const { result } = renderHook(() => useRevokeInvitation(), { wrapper });
    await act(() => result.current.mutateAsync("i1"));
    expect(stale()).toMatchObject({ invitations: true, members: false, ledgerMine: false, heaters: false });
  });

  it("a stop write puts the run's answer in its cache and refreshes the runs, but not the planner's route (a pure computation)", async () => {
    const { client, wrapper, stale } = setup();
    const { result } = renderHook(() => useUnskipStop("run1", "s1"), { wrapper });
    await act(() => result.current.mutateAsync());
    expect(client.getQueryData(runKeys.detail("run1"))).toEqual({ id: "run1", state: "under_way", stopList: [] });
    expect(stale()).toMatchObject({ run: true, runs: true, route: false, ledgerMine: false, heaters: false, invitations: false });
  });
});
