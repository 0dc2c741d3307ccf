"use client";

import { queryOptions, useMutation, useQueryClient, type QueryClient } from "@tanstack/react-query";
import { runKeys } from "./keys";
import { fetchJson } from "@/lib/api/client";
import type { RouteInputRaw } from "@/lib/runs/route-schemas";
import type { EditRunInput } from "@/lib/runs/schemas";
import type { RouteAnswer, RunDetail, SuggestionRow } from "@/lib/runs/types";
import type { After } from "./ledger";
import { newKey } from "@/lib/api/idempotency-key";

export type { RouteAnswer, SuggestionRow };

export { runKeys };

// The pickup-run domain's keys, reads and writes. Every key starts with
// "runs"; a write to a run puts its new state in the cache and refreshes the rest.

/**
 * Marks the runs' reads stale after a write. The planner's route is left
 * alone: it is a pure computation over the coordinates sent (its key holds
 * them all), so no write can make it wrong.
 */
function refreshRuns(client: QueryClient) {
  return client.invalidateQueries({ queryKey: runKeys.all, predicate: (query) => query.queryKey[1] !== "route" });
}

export const runQueries = {
  detail: (id: string) => queryOptions({ queryKey: runKeys.detail(id), queryFn: ({ signal }) => fetchJson<RunDetail>(`/api/runs/${id}`, { signal }) }),
  suggestions: (driveId: string) =>
    queryOptions({
      queryKey: runKeys.suggestions(driveId),
      queryFn: ({ signal }) => fetchJson<SuggestionRow[]>(`/api/runs/suggestions?driveId=${driveId}`, { signal }),
    }),
  /** A pure computation over the coordinates: the same input always has the same answer. */
  route: (input: RouteInputRaw) =>
    queryOptions({
      queryKey: runKeys.route(input),
      queryFn: ({ signal }) => fetchJson<RouteAnswer>("/api/plan/route", { method: "POST", json: input, signal }),
      staleTime: Infinity,
    }),
};

/** Plans a run (POST /api/runs). */
export function useCreateRun(after: After<{ id: string }, unknown> = {}) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: unknown) => fetchJson<{ id: string }>("/api/runs", { method: "POST", json: body }),
    onSuccess: async (run, body) => {
      await refreshRuns(client);
      await after.onSuccess?.(run, body);
    },
    onError: (error, body) => after.onError?.(error, body),
  });
}

/** A write to one stop that answers with the run as it is now: that answer goes in the cache at once. */
function useStopWrite<TVars>(runId: string, send: (vars: TVars) => Promise<unknown>, after: After<unknown, TVars>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: async (run, vars) => {
      client.setQueryData(runKeys.detail(runId), run as RunDetail);
      void refreshRuns(client);
      await after.onSuccess?.(run, vars);
    },
    onError: (error, vars) => after.onError?.(error, vars),
  });
}

export interface StopHaul {
  bags: number;
  weightKg: number | null;
  confirmUnusual: boolean;
  /** Reused on a retry after a dropped connection, so the haul is never logged twice. */
  idempotencyKey: string;
}

/** Logs the stop's haul in the ledger and settles the stop, in one request. */
export function useLogStopHaul(runId: string, stopId: string, after: After<unknown, StopHaul> = {}) {
  return useStopWrite<StopHaul>(
    runId,
    async ({ bags, weightKg, confirmUnusual, idempotencyKey }) => {
      const body: Record<string, unknown> = { bags };
      if (weightKg !== null) body.weightKg = weightKg;
      if (confirmUnusual) body.confirmUnusual = true;
      const res = await fetchJson<{ run: unknown }>(`/api/runs/${runId}/stops/${stopId}/haul`, { method: "POST", json: body, headers: { "Idempotency-Key": idempotencyKey } });
      return res.run;
    },
    after,
  );
}

export function useSkipStop(runId: string, stopId: string, after: After<unknown, string> = {}) {
  return useStopWrite<string>(runId, (reason) => fetchJson(`/api/runs/${runId}/stops/${stopId}/skip`, { method: "POST", json: { reason } }), after);
}

/** A skipped stop goes back on the run, pending. */
export function useUnskipStop(runId: string, stopId: string, after: After<unknown, void> = {}) {
  return useStopWrite<void>(runId, () => fetchJson(`/api/runs/${runId}/stops/${stopId}/unskip`, { method: "POST", json: {} }), after);
}

/** Undoes a stop's haul in the ledger, which reopens the stop: the run is read again. */
export function useUndoStopHaul(movementId: string, idempotencyKey: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => fetchJson(`/api/movements/${movementId}/reversal`, { method: "POST", json: {}, headers: { "Idempotency-Key": idempotencyKey } }),
    onSuccess: () => void refreshRuns(client),
  });
}


/** Changes a run's day, volunteer or notes (PATCH: the same values again change nothing). */
/** Changes what is named (the PATCH route's own input type): the day, the volunteer, the notes. */
export function useEditRun(runId: string, after: After<unknown, EditRunInput> = {}) {
  return useStopWrite(runId, (body: EditRunInput) => fetchJson(`/api/runs/${runId}`, { method: "PATCH", json: body }), after);
}

/** Stores the run's drop points in this visiting order (adds, removes, reorders). */
export function useSetStops(runId: string, after: After<unknown, string[]> = {}) {
  return useStopWrite(runId, (dropPointIds: string[]) => fetchJson(`/api/runs/${runId}/stops`, { method: "PUT", json: { dropPointIds } }), after);
}

/** The stops still to visit in the shortest order; each press is its own request (own Idempotency-Key). */
export function useOptimiseRun(runId: string, after: After<unknown, void> = {}) {
  return useStopWrite<void>(runId, () => fetchJson(`/api/runs/${runId}/optimise`, { method: "POST", json: {}, headers: { "Idempotency-Key": newKey() } }), after);
}

/** Cancels the run (a second cancel is 409: the run is already cancelled). */
export function useCancelRun(runId: string, after: After<unknown, string> = {}) {
  return useStopWrite<string>(runId, (reason) => fetchJson(`/api/runs/${runId}/cancel`, { method: "POST", json: { reason }, headers: { "Idempotency-Key": newKey() } }), after);
}
