import Link from "next/link";
import { Card, EmptyState } from "@/components/ui/card";
import { LEVEL_LABEL } from "@/lib/drives/fill";
import { formatter, NBSP, type Look } from "@/lib/format";
import type { DriveFillReport, DrivePledge } from "@/lib/drives/types";


export function PledgesAndReports({ pledges, reports, points, slug, look }: { pledges: DrivePledge[]; reports: DriveFillReport[]; points: { id: string; name: string }[]; slug: string; look: Look }) {
  const f = formatter(look);
  return (
    <>
      <Card title={`Pledges (${pledges.length})`}>
        {pledges.length === 0 ? (
          <EmptyState title="No pledges yet">Share the public page; donors can pledge bags there.</EmptyState>
        ) : (
          <ul className="divide-y divide-paper-edge" aria-label="Pledges">
            {pledges.map((p) => (
              <li key={p.id} className="py-2">
                <strong>{f.count(p.bags, "bag")}</strong> to {p.dropPointName} on {f.day(p.bringOn)}
                <span className="block text-sm text-ink-soft">{p.name || "Anonymous"}{p.email ? ` · ${p.email}` : ""}</span>
              </li>
            ))}
          </ul>
        )}
      </Card>
      <Card title="Fill reports">
        {reports.length === 0 ? (
          <EmptyState title="No fill reports yet" />
        ) : (
          <ul className="divide-y divide-paper-edge" aria-label="Fill reports">
            {reports.map((r) => (
              <li key={r.id} className="py-2">
                <strong>{r.dropPointName}</strong>: {LEVEL_LABEL[r.level] ?? `${r.level}${NBSP}%`} {r.alerted ? <span className="font-semibold text-alarm">· alert sent</span> : null}
                <span className="block text-sm text-ink-soft">{f.moment(r.createdAt)}{r.note ? ` · “${r.note}”` : ""}</span>
                {r.photoUrl ? <a href={r.photoUrl}>See the photo</a> : null}
              </li>
            ))}
          </ul>
        )}
      </Card>
      <Card title="Printable signs">
        <ul className="flex flex-col gap-1">
          {points.map((p) => (
            <li key={p.id}>
              <Link href={`/drives/${slug}/sign/${p.id}`}>Sign for {p.name}</Link>
            </li>
          ))}
        </ul>
      </Card>
    </>
  );
}
