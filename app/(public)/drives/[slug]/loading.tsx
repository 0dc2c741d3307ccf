import { Skeleton } from "@/components/ui/card";

export default function Loading() {
  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-4 px-4 py-6" aria-busy="true" aria-label="Loading the drive">
      <Skeleton className="h-10 w-2/3" />
      <Skeleton className="h-24 w-full" />
      <Skeleton className="h-80 w-full" />
    </main>
  );
}
