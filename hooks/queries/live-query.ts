"use client";

import { useQueryClient, type QueryKey } from "@tanstack/react-query";
import { useCallback, useEffect, useSyncExternalStore } from "react";

// The public drive page's live reads, kept in react-query's cache like every
// other read, but without useQuery: its observer machinery is about 3 kB of
// compressed JavaScript, and that page's first load is held to 200 kB
// (tests/e2e/drive-page-weight.test.ts) with its forms working before (and
// without) JavaScript. This asks again every `refetchInterval` while the page
// is visible and when it comes back into view; a fetch of the same key
// anywhere (the bin report's, after it is stored) shows here at once.
export function useLiveQuery<T>(
  options: { queryKey: QueryKey; queryFn?: unknown; refetchInterval?: unknown },
  initialData: T,
): { data: T; isError: boolean; updatedAt: number } {
  const client = useQueryClient();
  const { queryKey } = options;
  const queryFn = options.queryFn as () => Promise<T>;
  const every = Number(options.refetchInterval) || 30_000;
  const hash = JSON.stringify(queryKey);
  const subscribe = useCallback((onChange: () => void) => client.getQueryCache().subscribe(onChange), [client]);
  const data = useSyncExternalStore(subscribe, () => client.getQueryData<T>(queryKey) ?? initialData, () => initialData);
  // When the shown data was fetched here; 0 while it is still the server's.
  const updatedAt = useSyncExternalStore(subscribe, () => client.getQueryState(queryKey)?.dataUpdatedAt ?? 0, () => 0);
  const isError = useSyncExternalStore(subscribe, () => client.getQueryState(queryKey)?.status === "error", () => false);

  useEffect(() => {
    const again = () => {
      if (document.visibilityState === "visible") void client.fetchQuery({ queryKey, queryFn, staleTime: 0, retry: false }).catch(() => undefined);
    };
    const timer = setInterval(again, every);
    document.addEventListener("visibilitychange", again);
    return () => {
      clearInterval(timer);
      document.removeEventListener("visibilitychange", again);
    };
    // The key's content, not its identity, decides (a new array each render).
    // eslint-disable-next-line react-hooks/exhaustive-deps -- hash stands for queryKey and queryFn
  }, [client, hash, every]);

  return { data, isError, updatedAt };
}
