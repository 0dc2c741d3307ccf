"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/client";
import type { FullBin } from "@/lib/drives/types";
import { recordUrl, type RecordKind } from "@/lib/records/kinds";
import { driveKeys } from "./drives";
import type { After } from "./ledger";
import { newKey } from "@/lib/api/idempotency-key";

// The organisers' writes on drives and drop points, apart from ./drives.ts so
// the public drive page never loads mutation code. Their pages are rendered
// on the server: each write refreshes the drive's reads here, and the page
// calls router.refresh() in `after.onSuccess`.

/** A drop point's pin dragged on the map (PATCH /api/drop-points/:id). */
export function useMoveDropPoint(after: After<unknown, { id: string; lat: number; lng: number }> = {}) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (v: { id: string; lat: number; lng: number }) => fetchJson(`/api/drop-points/${v.id}`, { method: "PATCH", body: { lat: v.lat, lng: v.lng } }),
    onSuccess: async (data, v) => {
      await client.invalidateQueries({ queryKey: driveKeys.all });
      await after.onSuccess?.(data, v);
    },
    onError: (error, v) => after.onError?.(error, v),
  });
}

/** Takes a full report off the dashboard (POST /api/drop-points/:id/fill-clear). */
export function useClearFullBin(after: After<unknown, FullBin> = {}) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (b: FullBin) => fetchJson(`/api/drop-points/${b.dropPointId}/fill-clear`, { method: "POST", body: { asOf: b.reportedAt } }),
    onSuccess: async (data, b) => {
      await client.invalidateQueries({ queryKey: driveKeys.all });
      await after.onSuccess?.(data, b);
    },
    onError: (error, b) => after.onError?.(error, b),
  });
}

export interface RecordActionVars {
  kind: RecordKind;
  id: string;
  action: "archive" | "restore" | "delete";
}

/** Archive, restore or delete one record (issue 16): POST /api/<kind>/{id}/archive | restore | delete, with a fresh Idempotency-Key. */
export function useRecordAction(after: After<unknown, RecordActionVars> = {}) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (v: RecordActionVars) =>
      fetchJson(recordUrl(v.kind, v.id, v.action), { method: "POST", body: v.action === "delete" ? { confirm: true } : {}, headers: { "Idempotency-Key": newKey() } }),
    onSuccess: async (data, v) => {
      await client.invalidateQueries({ queryKey: driveKeys.all });
      await after.onSuccess?.(data, v);
    },
    onError: (error, v) => after.onError?.(error, v),
  });
}
