import { Card, Skeleton } from "@/components/ui/card";

// In a route group so the pages with an id (../[id]) are not under this
// loading boundary: once it has streamed, notFound() can no longer make the
// answer a 404, and another group's record must be one.

export default function Loading() {
  return (
    <main className="flex flex-col gap-6" aria-busy="true">
      <Skeleton className="h-9 w-56" />
      <Card>
        <div className="flex flex-col gap-3">
          <Skeleton />
          <Skeleton />
          <Skeleton className="h-5 w-2/3" />
        </div>
      </Card>
    </main>
  );
}
