import { dehydrate, HydrationBoundary, QueryClient, type QueryKey } from "@tanstack/react-query";
import type { ReactNode } from "react";

/**
 * What a server page has already read, handed to the client's query cache
 * under the same keys the client's reads use (hooks/queries/<domain>.ts), so
 * the first render shows it and later reads refresh it: the one way a
 * signed-in page passes data to its live parts.
 */
export function Prefetched({ data, children }: { data: ReadonlyArray<readonly [QueryKey, unknown]>; children: ReactNode }) {
  const client = new QueryClient();
  for (const [key, value] of data) client.setQueryData(key, value);
  return <HydrationBoundary state={dehydrate(client)}>{children}</HydrationBoundary>;
}
