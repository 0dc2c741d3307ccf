import { Card, Skeleton } from "@/components/ui/card";

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
