import { queryOptions } from "@tanstack/react-query";
import { apiFetch } from "@/lib/api/client";

// Client-side shapes of the public endpoints (the server types them in public-service.ts).
export interface PublicDropPointView {
  id: string;
  name: string;
  address: string;
  lat: number;
  lng: number;
  hours: string;
  capacityBags: number;
  fillLevel: number | null;
  fillReportedAt: string | null;
  photos: string[];
  tallies: { hauls: number; bags: number; goodCans: number; rejectedCans: number };
}

export interface PublicDriveView {
  drive: { slug: string; name: string; startsOn: string; endsOn: string; description: string; wanted: string; groupName: string };
  target: { cans: number; heaters: number };
  progress: { goodCans: number; estimatedUnsorted: number; yield: number; remaining: number; heatersCovered: number };
}

export const LIVE_REFRESH_MS = 30_000;

export const publicDriveQuery = (slug: string) =>
  queryOptions({
    queryKey: ["public-drive", slug],
    queryFn: () => apiFetch<PublicDriveView>(`/api/public/drives/${encodeURIComponent(slug)}`),
    refetchInterval: LIVE_REFRESH_MS,
    refetchOnWindowFocus: true,
  });

export const publicDropPointsQuery = (slug: string) =>
  queryOptions({
    queryKey: ["public-drive", slug, "drop-points"],
    queryFn: () => apiFetch<PublicDropPointView[]>(`/api/public/drives/${encodeURIComponent(slug)}/drop-points`),
    refetchInterval: LIVE_REFRESH_MS,
    refetchOnWindowFocus: true,
  });
