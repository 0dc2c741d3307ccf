"use client";

import { infiniteQueryOptions, queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import { ledgerKeys } from "./keys";
import { useCallback } from "react";
import { fetchJson, fetchJsonWithHeaders } from "@/lib/api/client";
import { LEDGER_SCREEN_PAGE, NEXT_CURSOR_HEADER, TOTAL_HEADER, TOTAL_OVER_HEADER } from "@/lib/ledger/ledger-page";
import type { DriveStock, LedgerPage, LedgerRow, MyEntry, OpenHaul, PostedStockCount } from "@/lib/ledger/types";
import { newKey } from "@/lib/api/idempotency-key";

export type { MyEntry, OpenHaul };

export { ledgerKeys };

// The ledger domain's keys, reads and writes. Every key starts with "ledger";
// any write that moves cans refreshes them all (stock, hauls, entries, list).

async function fetchPage(query: string, cursor: string | null): Promise<LedgerPage> {
  // A screen's worth at a time; the CSV export (built from the same filters) has no limit.
  const qs = [query, `limit=${LEDGER_SCREEN_PAGE}`, cursor ? `cursor=${cursor}` : ""].filter(Boolean).join("&");
  const { body, headers } = await fetchJsonWithHeaders<LedgerRow[]>(`/api/ledger?${qs}`);
  // The first page carries the count (exact, or "over" the cap); the pages after it none.
  const [exact, over] = [headers.get(TOTAL_HEADER), headers.get(TOTAL_OVER_HEADER)];
  const total = exact !== null ? Number(exact) : over !== null ? Number(over) : null;
  return { rows: body, total, totalOver: exact === null && over !== null, nextCursor: headers.get(NEXT_CURSOR_HEADER) };
}

export const ledgerQueries = {
  stock: (driveId: string) =>
    queryOptions({ queryKey: ledgerKeys.stock(driveId), queryFn: () => fetchJson<DriveStock>(`/api/drives/${driveId}/stock`), enabled: !!driveId }),
  openHauls: (driveId: string) =>
    queryOptions({ queryKey: ledgerKeys.openHauls(driveId), queryFn: () => fetchJson<OpenHaul[]>(`/api/drives/${driveId}/hauls?open=1`), enabled: !!driveId }),
  mine: () => queryOptions({ queryKey: ledgerKeys.mine(), queryFn: () => fetchJson<MyEntry[]>(`/api/ledger?mine=1`) }),
  /** The organiser's ledger, a page at a time; `query` is the filters as the URL's query string. */
  list: (filters: Record<string, string>, query: string) =>
    infiniteQueryOptions({
      queryKey: ledgerKeys.list(filters),
      queryFn: ({ pageParam }) => fetchPage(query, pageParam),
      initialPageParam: null as string | null,
      getNextPageParam: (last) => last.nextCursor,
    }),
};

/** What a component does after a write, before the ledger's reads are refreshed. */
export interface After<TData, TVars> {
  onSuccess?: (data: TData, vars: TVars) => unknown;
  onError?: (error: Error, vars: TVars) => unknown;
}

/** Refreshes every ledger read; for writes that are not a mutation here (the phone's outbox). */
export function useLedgerChanged() {
  const client = useQueryClient();
  return useCallback(() => client.invalidateQueries({ queryKey: ledgerKeys.all }), [client]);
}

export interface UndoVars {
  movementId: string;
  /** The organiser's reason (the full ledger asks for one); none from a person's own recent entries. */
  reason?: string;
  /** Defaults to one key per movement, so undoing the same entry twice is one undo. */
  idempotencyKey?: string;
}

/** Undoes a movement (POST /api/movements/:id/reversal). */
export function useUndoMovement(after: After<unknown, UndoVars> = {}) {
  const refresh = useLedgerChanged();
  return useMutation({
    mutationFn: ({ movementId, reason, idempotencyKey }: UndoVars) =>
      fetchJson(`/api/movements/${movementId}/reversal`, {
        method: "POST",
        ...(reason === undefined ? {} : { body: { reason } }),
        headers: { "idempotency-key": idempotencyKey ?? `undo-${movementId}` },
      }),
    onSuccess: async (data, vars) => {
      await after.onSuccess?.(data, vars);
      await refresh();
    },
    onError: (error, vars) => after.onError?.(error, vars),
  });
}

/** Rejected cans taken to recycling (POST /api/drives/:id/recycling). */
export function useRecordRecycling<TBody extends { quantity: number }>(driveId: string, after: After<unknown, TBody> = {}) {
  const refresh = useLedgerChanged();
  return useMutation({
    mutationFn: (body: TBody) =>
      fetchJson(`/api/drives/${driveId}/recycling`, { method: "POST", json: body, headers: { "idempotency-key": newKey() } }),
    onSuccess: async (data, body) => {
      await after.onSuccess?.(data, body);
      await refresh();
    },
    onError: (error, body) => after.onError?.(error, body),
  });
}

/** A stock count's differences as one adjustment (POST /api/drives/:id/stock-counts); refused or not, the totals are read again. */
export function usePostStockCount(driveId: string, after: After<PostedStockCount, unknown> = {}) {
  const refresh = useLedgerChanged();
  return useMutation({
    mutationFn: (body: unknown) =>
      fetchJson<PostedStockCount>(`/api/drives/${driveId}/stock-counts`, { method: "POST", json: body, headers: { "idempotency-key": newKey() } }),
    onSuccess: async (data, body) => {
      await after.onSuccess?.(data, body);
      await refresh();
    },
    onError: async (error, body) => {
      await after.onError?.(error, body);
      await refresh();
    },
  });
}
