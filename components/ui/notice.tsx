import type { ReactNode } from "react";

type Tone = "caution" | "info" | "good";

const TONE: Record<Tone, string> = {
  caution: "border-sun bg-sun-soft",
  info: "border-ink/30 bg-paper-deep",
  good: "border-moss bg-moss-soft",
};

export function Notice({ tone = "info", title, children }: { tone?: Tone; title: string; children?: ReactNode }) {
  return (
    <aside className={`rounded-card border-l-8 p-4 ${TONE[tone]}`} role={tone === "caution" ? "note" : undefined}>
      <p className="font-bold">{title}</p>
      {children ? <div className="mt-1 text-ink-soft">{children}</div> : null}
    </aside>
  );
}
