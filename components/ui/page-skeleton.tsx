import { Skeleton } from "./card";

/** A page's loading placeholder: a title bar, then blocks of the given heights (Tailwind classes). */
export function PageSkeleton({ title, blocks, narrow = false, label }: { title: string; blocks: string[]; narrow?: boolean; label?: string }) {
  return (
    <main className={`${narrow ? "mx-auto max-w-xl " : ""}flex flex-col gap-4`} aria-busy="true" aria-label={label}>
      <Skeleton className={`h-9 ${title}`} />
      {blocks.map((height, i) => (
        <Skeleton key={i} className={`${height} w-full`} />
      ))}
    </main>
  );
}
