import Link from "next/link";
import { EmptyState } from "@/components/ui/card";
import { RUN_STATE_LABEL, type RunState } from "@/lib/runs/schemas";
import { formatter, type Look } from "@/lib/format";
import type { RunSummary } from "@/lib/runs/types";

const BADGE: Record<RunState, string> = {
  planned: "bg-paper-deep text-ink-soft",
  under_way: "bg-sun-soft text-sun",
  done: "bg-moss-soft text-moss-deep",
  cancelled: "bg-paper-deep text-ink-soft",
};

export function RunStateBadge({ state }: { state: RunState }) {
  return <span className={`rounded px-2 py-0.5 text-sm font-semibold ${BADGE[state]}`}>{RUN_STATE_LABEL[state]}</span>;
}

export function RunList({ runs, empty, look }: { runs: RunSummary[]; empty: string; look: Look }) {
  if (runs.length === 0) return <EmptyState title={empty} />;
  const f = formatter(look);
  return (
    <ul className="divide-y divide-paper-edge">
      {runs.map((r) => (
        <li key={r.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
          <span>
            <Link href={`/runs/${r.id}`} className="text-lg font-semibold">
              {f.day(r.plannedOn)} · {r.assigneeName ?? "nobody assigned"}
            </Link>{" "}
            <RunStateBadge state={r.state} />
          </span>
          <span className="text-ink-faint">
            {r.driveName} · {f.count(r.stops, "stop")} ({f.number(r.logged)} logged, {f.number(r.skipped)} skipped) · {f.distance(r.distanceKm)}
          </span>
        </li>
      ))}
    </ul>
  );
}
