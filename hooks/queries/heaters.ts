import { queryOptions } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/client";
import type { HeaterCreateInput, HeaterState } from "@/lib/heaters/unit-schemas";

// Keys and calls for heater units; mutations invalidate through `heaterKeys`.
export const heaterKeys = {
  all: ["heaters"] as const,
  detail: (id: string) => ["heaters", id] as const,
  list: () => ["heaters", "list"] as const,
};

/** One entry of `GET /api/heaters`: the contract's fields plus the unit's need. */
export interface HeaterSummary {
  id: string;
  name: string;
  driveId: string | null;
  builderId: string | null;
  cans: number;
  claimed: number;
  builtIn: number;
  state: HeaterState;
  spare: number;
  need: number;
  remaining: number;
}

export const heatersQuery = () => queryOptions({ queryKey: heaterKeys.list(), queryFn: () => fetchJson<HeaterSummary[]>("/api/heaters") });

export interface SavedHeater {
  id: string;
  name: string;
  cans: number;
  state: HeaterState;
}

export function createHeater(input: HeaterCreateInput) {
  return fetchJson<SavedHeater>("/api/heaters", { method: "POST", json: input });
}

export function moveHeater(id: string, state: HeaterState) {
  return fetchJson<SavedHeater & { released: number }>(`/api/heaters/${id}/state`, { method: "POST", json: { state } });
}

export type ClaimAction = "claims" | "releases" | "built-in";

/** A ledger movement for the unit; a fresh Idempotency-Key per submit so a retried request never doubles. */
export function postClaimAction(id: string, action: ClaimAction, quantity: number, key: string) {
  return fetchJson<{ movementId: string; claimed: number; builtIn: number }>(`/api/heaters/${id}/${action}`, {
    method: "POST",
    json: { quantity },
    headers: { "Idempotency-Key": key },
  });
}

export function moveClaimsTo(id: string, toHeaterId: string, quantity: number, key: string) {
  return fetchJson<unknown>(`/api/heaters/${id}/claim-moves`, { method: "POST", json: { toHeaterId, quantity }, headers: { "Idempotency-Key": key } });
}
