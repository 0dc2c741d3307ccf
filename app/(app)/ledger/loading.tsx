import { Skeleton } from "@/components/ui/card";

export default function Loading() {
  return (
    <main className="flex flex-col gap-4" aria-busy="true">
      <Skeleton className="h-9 w-40" />
      <Skeleton className="h-64 w-full" />
      <Skeleton className="h-48 w-full" />
    </main>
  );
}
