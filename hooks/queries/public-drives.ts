import { queryOptions } from "@tanstack/react-query";
import { fetchJson } from "@/lib/api/client";

export interface PublicDrive {
  slug: string;
  name: string;
  startsOn: string;
  endsOn: string;
}

export const publicDriveQueries = {
  all: () => ["public-drives"] as const,
  list: () =>
    queryOptions({
      queryKey: [...publicDriveQueries.all(), "list"] as const,
      queryFn: ({ signal }) => fetchJson<PublicDrive[]>("/api/public/drives", { signal }),
      staleTime: 30_000,
    }),
};
