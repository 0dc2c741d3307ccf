"use client";

import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import { heaterKeys } from "./keys";
import { fetchJson } from "@/lib/api/client";
import type { HeaterCreateInput, HeaterState } from "@/lib/heaters/unit-schemas";
import type { CanGridInput } from "@/lib/heaters/schemas";
import type { ClaimAction, ClaimResult, HeaterSummary, SavedHeater } from "@/lib/heaters/types";
import { ledgerKeys, type After } from "./ledger";
import { newKey } from "@/lib/api/idempotency-key";

export type { ClaimAction, HeaterSummary, SavedHeater };

export { heaterKeys };

// The heater domain's keys, reads and writes. Every key starts with
// "heaters"; a write that moves cans also refreshes the ledger's reads.

export const heaterQueries = {
  list: () => queryOptions({ queryKey: heaterKeys.list(), queryFn: () => fetchJson<HeaterSummary[]>("/api/heaters") }),
};

export function postClaimAction(id: string, action: ClaimAction, quantity: number, key: string) {
  return fetchJson<ClaimResult>(`/api/heaters/${id}/${action}`, { method: "POST", json: { quantity }, headers: { "Idempotency-Key": key } });
}

export function moveClaimsTo(id: string, toHeaterId: string, quantity: number, key: string) {
  return fetchJson<unknown>(`/api/heaters/${id}/claim-moves`, { method: "POST", json: { toHeaterId, quantity }, headers: { "Idempotency-Key": key } });
}

function useRefreshUnitsAndStock() {
  const client = useQueryClient();
  return () => Promise.all([client.invalidateQueries({ queryKey: heaterKeys.all }), client.invalidateQueries({ queryKey: ledgerKeys.all })]);
}

/** Saves a plan as a unit (POST /api/heaters). */
export function useCreateHeater(after: After<SavedHeater, HeaterCreateInput> = {}) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: HeaterCreateInput) => fetchJson<SavedHeater>("/api/heaters", { method: "POST", json: input }),
    onSuccess: async (unit, input) => {
      await client.invalidateQueries({ queryKey: heaterKeys.all });
      await after.onSuccess?.(unit, input);
    },
    onError: (error, input) => after.onError?.(error, input),
  });
}

/** Moves a unit to another state; installing gives its unbuilt claims back (`released`). */
export function useMoveHeater(id: string, after: After<SavedHeater & { released: number }, HeaterState> = {}) {
  const refresh = useRefreshUnitsAndStock();
  return useMutation({
    mutationFn: (state: HeaterState) => fetchJson<SavedHeater & { released: number }>(`/api/heaters/${id}/state`, { method: "POST", json: { state } }),
    onSuccess: async (data, state) => {
      await refresh();
      await after.onSuccess?.(data, state);
    },
    onError: (error, state) => after.onError?.(error, state),
  });
}

/**
 * A ledger movement for a unit (claim, release, built in, move claims): `run`
 * sends it with a fresh Idempotency-Key per submit, so a retried request never
 * doubles. The unit's figures and the drive's stock are read again, then
 * `after.onSuccess` runs (so a router.refresh there sees the new figures).
 */
export function useHeaterMovement(run: (quantity: number, key: string) => Promise<unknown>, after: After<unknown, number> = {}) {
  const refresh = useRefreshUnitsAndStock();
  return useMutation({
    mutationFn: (quantity: number) => run(quantity, newKey()),
    onSuccess: async (data, quantity) => {
      await refresh();
      await after.onSuccess?.(data, quantity);
    },
    onError: (error, quantity) => after.onError?.(error, quantity),
  });
}

/** Archives (true) or restores (false) a unit; archiving gives its unbuilt claims back (`released`). */
export function useArchiveHeater(id: string, after: After<SavedHeater & { released: number }, boolean> = {}) {
  const refresh = useRefreshUnitsAndStock();
  return useMutation({
    mutationFn: (archive: boolean) =>
      fetchJson<SavedHeater & { released: number }>(`/api/heaters/${id}/${archive ? "archive" : "restore"}`, { method: "POST", json: {} }),
    onSuccess: async (data, archive) => {
      await refresh();
      await after.onSuccess?.(data, archive);
    },
    onError: (error, archive) => after.onError?.(error, archive),
  });
}

/** A unit's new glazing (POST /api/heaters/{id}/glazing); the units and the drive's figures are read again. */
export function useChangeGlazing(id: string, after: After<SavedHeater & { was: number }, CanGridInput> = {}) {
  const refresh = useRefreshUnitsAndStock();
  return useMutation({
    mutationFn: (plan: CanGridInput) =>
      fetchJson<SavedHeater & { was: number }>(`/api/heaters/${id}/glazing`, { method: "POST", json: { plan }, headers: { "Idempotency-Key": newKey() } }),
    onSuccess: async (data, plan) => {
      await refresh();
      await after.onSuccess?.(data, plan);
    },
    onError: (error, plan) => after.onError?.(error, plan),
  });
}
