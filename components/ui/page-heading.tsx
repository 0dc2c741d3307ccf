import type { ReactNode } from "react";

/** A signed-in page's title with its main actions beside it (they wrap below it on a phone). */
export function PageHeading({ title, children }: { title: ReactNode; children?: ReactNode }) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-3">
      <h1 className="text-3xl">{title}</h1>
      {children}
    </div>
  );
}
