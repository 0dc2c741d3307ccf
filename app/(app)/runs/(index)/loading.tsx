import { Skeleton } from "@/components/ui/card";

// In a route group so the pages with an id (../[id]) are not under this
// loading boundary: once it has streamed, notFound() can no longer make the
// answer a 404, and another group's record must be one.

export default function Loading() {
  return (
    <main className="flex flex-col gap-4" aria-busy="true" aria-label="Loading the pickup run page">
      <Skeleton className="h-9 w-64" />
      <Skeleton className="h-40 w-full" />
      <Skeleton className="h-40 w-full" />
    </main>
  );
}
