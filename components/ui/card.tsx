import type { ReactNode } from "react";

export function Card({ title, children, className = "" }: { title?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section className={`rounded-card border border-paper-edge bg-white/70 p-4 shadow-sm sm:p-5 ${className}`}>
      {title ? <h2 className="mb-3 text-lg">{title}</h2> : null}
      {children}
    </section>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-card border-2 border-dashed border-paper-edge p-6 text-center text-ink-soft">
      <p className="font-semibold text-ink">{title}</p>
      {children ? <div className="mt-2">{children}</div> : null}
    </div>
  );
}

export function Skeleton({ className = "h-5 w-full" }: { className?: string }) {
  return <div aria-hidden="true" className={`animate-pulse rounded bg-paper-deep ${className}`} />;
}
