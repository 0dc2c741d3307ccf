import { Skeleton } from "@/components/ui/card";

export default function Loading() {
  return (
    <main className="flex flex-col gap-4" aria-busy="true" aria-label="Loading the pickup run page">
      <Skeleton className="h-9 w-64" />
      <Skeleton className="h-40 w-full" />
      <Skeleton className="h-40 w-full" />
    </main>
  );
}
