import { queryOptions } from "@tanstack/react-query";
import { apiFetch } from "@/lib/api/client";

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
      queryFn: ({ signal }) => apiFetch<PublicDrive[]>("/api/public/drives", { signal }),
      staleTime: 30_000,
    }),
};
