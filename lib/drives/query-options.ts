import { queryOptions } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/client";
import type { PublicDropPointWithTallies } from "@/lib/drives/public-queries";

// Client-side shapes of the public endpoints. The drop point's shape is the
// query's own (a type-only import: nothing server-side reaches the bundle).
export type PublicDropPointView = PublicDropPointWithTallies;

export interface PublicDriveView {
  drive: { slug: string; name: string; startsOn: string; endsOn: string; description: string; wanted: string; groupName: string };
  target: { cans: number; heaters: number };
  progress: { goodCans: number; estimatedUnsorted: number; yield: number; remaining: number; heatersCovered: number };
}

export const LIVE_REFRESH_MS = 30_000;

export const publicDriveQuery = (slug: string) =>
  queryOptions({
    queryKey: ["public-drive", slug],
    queryFn: () => fetchJson<PublicDriveView>(`/api/public/drives/${encodeURIComponent(slug)}`),
    refetchInterval: LIVE_REFRESH_MS,
    refetchOnWindowFocus: true,
  });

export const publicDropPointsQuery = (slug: string) =>
  queryOptions({
    queryKey: ["public-drive", slug, "drop-points"],
    queryFn: () => fetchJson<PublicDropPointView[]>(`/api/public/drives/${encodeURIComponent(slug)}/drop-points`),
    refetchInterval: LIVE_REFRESH_MS,
    refetchOnWindowFocus: true,
  });
