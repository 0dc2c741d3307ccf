import { queryOptions } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/client";
import type { RouteInputRaw } from "@/lib/runs/route-schemas";

// Shapes as the API sends them (dates as strings).
export interface RouteAnswer {
  order: string[];
  distanceKm: number;
  legs: { from: string | null; to: string | null; distanceKm: number }[];
}

export interface SuggestionRow {
  id: string;
  name: string;
  address: string;
  lat: number;
  lng: number;
  hours: string;
  capacityBags: number;
  lastHaulAt: string | null;
  daysSinceHaul: number | null;
  expectedFill: number | null;
  reportedFill: number | null;
  reportedFull: boolean;
  suggested: boolean;
}

export const runQueries = {
  all: () => ["runs"] as const,
  detail: <T>(id: string) =>
    queryOptions({ queryKey: ["runs", id], queryFn: ({ signal }) => fetchJson<T>(`/api/runs/${id}`, { signal }) }),
  suggestions: (driveId: string) =>
    queryOptions({
      queryKey: ["runs", "suggestions", driveId],
      queryFn: ({ signal }) => fetchJson<SuggestionRow[]>(`/api/runs/suggestions?driveId=${driveId}`, { signal }),
    }),
  route: (input: RouteInputRaw) =>
    queryOptions({
      queryKey: ["route", input],
      queryFn: ({ signal }) => fetchJson<RouteAnswer>("/api/plan/route", { method: "POST", json: input, signal }),
      staleTime: Infinity,
    }),
};
