import { queryOptions, useQueryClient } from "@tanstack/react-query";
import { driveKeys } from "./drive-keys";
import { useCallback } from "react";
import { fetchJson } from "@/lib/api/client";
import type { PublicDriveView, PublicDropPointView } from "@/lib/drives/types";

export type { PublicDriveView, PublicDropPointView };

export { driveKeys };

// The drive domain's keys and reads. Every key starts with "drives". The
// public drive page reads these through useLiveQuery (./live-query.ts), never
// useQuery, and this module imports no mutation code: that page's first load
// is held to 200 kB (tests/e2e/drive-page-weight.test.ts). The organisers'
// writes are in ./drive-writes.ts for the same reason.
export const LIVE_REFRESH_MS = 30_000;


export const driveQueries = {
  public: (slug: string) =>
    queryOptions({
      queryKey: driveKeys.public(slug),
      queryFn: () => fetchJson<PublicDriveView>(`/api/public/drives/${encodeURIComponent(slug)}`),
      refetchInterval: LIVE_REFRESH_MS,
      refetchOnWindowFocus: true,
    }),
  publicDropPoints: (slug: string) =>
    queryOptions({
      queryKey: driveKeys.publicDropPoints(slug),
      queryFn: () => fetchJson<PublicDropPointView[]>(`/api/public/drives/${encodeURIComponent(slug)}/drop-points`),
      refetchInterval: LIVE_REFRESH_MS,
      refetchOnWindowFocus: true,
    }),
};

/**
 * After a bin report is stored (a server action, so it works without
 * JavaScript), the drive's drop points are read again at once; the live map
 * and list show the new fill. A failure leaves the last answer shown.
 */
export function useBinReported(slug: string) {
  const client = useQueryClient();
  return useCallback(() => void client.fetchQuery({ ...driveQueries.publicDropPoints(slug), staleTime: 0 }).catch(() => undefined), [client, slug]);
}
