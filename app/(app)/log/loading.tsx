import { Skeleton } from "@/components/ui/card";

export default function Loading() {
  return (
    <main className="mx-auto flex max-w-xl flex-col gap-4" aria-busy="true">
      <Skeleton className="h-9 w-48" />
      <Skeleton className="h-12 w-full" />
      <Skeleton className="h-72 w-full" />
    </main>
  );
}
