import { Card, Skeleton } from "@/components/ui/card";

export default function Loading() {
  return (
    <main className="flex flex-col gap-6" aria-busy="true">
      <Skeleton className="h-9 w-2/3" />
      <Card>
        <Skeleton className="h-32 w-full" />
      </Card>
      <Card>
        <Skeleton className="h-40 w-full" />
      </Card>
    </main>
  );
}
