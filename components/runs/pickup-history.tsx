import Link from "next/link";
import { formatter, type Look } from "@/lib/format";
import { countOf } from "@/lib/plural";

export interface HistoryPoint {
  id: string;
  name: string;
  driveName: string;
  history: { runId: string; plannedOn: string; status: "pending" | "logged" | "skipped" | "released"; skipReason: string | null; haulBags: number | null; assigneeName: string | null }[];
}

const STATUS_TEXT = { pending: "planned", logged: "haul logged", skipped: "skipped", released: "released (run cancelled)" } as const;

export function PickupHistory({ points, look }: { points: HistoryPoint[]; look: Look }) {
  const f = formatter(look);
  return (
    <ul className="flex flex-col gap-2">
      {points.map((p) => (
        <li key={p.id}>
          <details className="rounded-lg border border-paper-edge bg-white p-3">
            <summary className="min-h-11 cursor-pointer py-2.5 font-semibold">
              {p.name} <span className="font-normal text-ink-faint">· {p.driveName} · {countOf(p.history.length, "visit")} on runs</span>
            </summary>
            {p.history.length === 0 ? (
              <p className="mt-2 text-ink-soft">No run has visited this drop point yet.</p>
            ) : (
              <ol className="mt-2 flex flex-col gap-1">
                {p.history.map((h) => (
                  <li key={h.runId}>
                    <Link href={`/runs/${h.runId}`}>{f.day(h.plannedOn)}</Link> · {h.assigneeName ?? "nobody"} · {STATUS_TEXT[h.status]}
                    {h.haulBags !== null ? `: ${countOf(h.haulBags, "bag")}` : null}
                    {h.skipReason ? <span className="text-ink-faint"> — “{h.skipReason}”</span> : null}
                  </li>
                ))}
              </ol>
            )}
          </details>
        </li>
      ))}
    </ul>
  );
}
