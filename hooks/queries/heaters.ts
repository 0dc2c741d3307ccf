import { queryOptions } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/fetch-json";
import type { HeaterCreateInput, HeaterState } from "@/lib/heaters/unit-schemas";

// Keys and calls for heater units; mutations invalidate through `heaterKeys`.
export const heaterKeys = {
  all: ["heaters"] as const,
  detail: (id: string) => ["heaters", id] as const,
};

export interface SavedHeater {
  id: string;
  name: string;
  cans: number;
  state: HeaterState;
}

export const heatersQuery = () =>
  queryOptions({ queryKey: heaterKeys.all, queryFn: () => fetchJson<SavedHeater[]>("/api/heaters") });

export function createHeater(input: HeaterCreateInput) {
  return fetchJson<SavedHeater>("/api/heaters", { body: input });
}

export function moveHeater(id: string, state: HeaterState) {
  return fetchJson<SavedHeater>(`/api/heaters/${id}/state`, { body: { state } });
}
