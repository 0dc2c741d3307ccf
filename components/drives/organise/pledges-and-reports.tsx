import Link from "next/link";
import { Card, EmptyState } from "@/components/ui/card";
import { LEVEL_LABEL } from "@/lib/drives/fill";
import { formatter, NBSP, type Look } from "@/lib/format";
import type { DriveFillReport, DrivePledge, PledgeHaulChoice } from "@/lib/drives/types";
import { PLEDGE_STATUS_LABEL } from "@/lib/drives/schemas";
import { RecordActions } from "@/components/records/record-actions";
import { PledgeMarker } from "./pledge-marker";

/** Bags pledged (still open or received) and bags received, per drop point. */
function bagsByPoint(pledges: DrivePledge[], points: { id: string; name: string }[]) {
  return points.map((pt) => {
    const mine = pledges.filter((p) => p.dropPointId === pt.id);
    const sum = (ps: DrivePledge[]) => ps.reduce((s, p) => s + p.bags, 0);
    return { id: pt.id, name: pt.name, pledged: sum(mine.filter((p) => p.status === "pledged" || p.status === "received")), received: sum(mine.filter((p) => p.status === "received")) };
  });
}


export function PledgesAndReports({ pledges, hauls, reports, points, slug, look, today }: { pledges: DrivePledge[]; hauls: PledgeHaulChoice[]; reports: DriveFillReport[]; points: { id: string; name: string }[]; slug: string; look: Look; today: string }) {
  const f = formatter(look);
  const counts = bagsByPoint(pledges, points);
  const haulLabel = (h: PledgeHaulChoice) => `${f.moment(h.hauledAt)} · ${f.count(h.bags, "bag")}`;
  const haulsAt = (pointId: string) => hauls.filter((h) => h.dropPointId === pointId).map((h) => ({ value: h.id, label: haulLabel(h) }));
  const haulById = new Map(hauls.map((h) => [h.id, h]));
  return (
    <>
      <Card title={`Pledges (${pledges.length})`}>
        {pledges.length === 0 ? (
          <EmptyState title="No pledges yet">Share the public page; donors can pledge bags there.</EmptyState>
        ) : (
          <>
            <table className="mb-3 w-full text-left" data-testid="pledge-counts">
              <caption className="sr-only">Bags pledged and received per drop point</caption>
              <thead>
                <tr className="text-sm text-ink-soft">
                  <th scope="col">Drop point</th>
                  <th scope="col" className="text-right">Pledged</th>
                  <th scope="col" className="text-right">Received</th>
                </tr>
              </thead>
              <tbody>
                {counts.map((c) => (
                  <tr key={c.id}>
                    <th scope="row" className="font-normal">{c.name}</th>
                    <td className="text-right tabular-nums">{f.count(c.pledged, "bag")}</td>
                    <td className="text-right tabular-nums">{f.count(c.received, "bag")}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <ul className="divide-y divide-paper-edge" aria-label="Pledges">
              {pledges.map((p) => {
                const past = p.status === "pledged" && p.bringOn < today;
                const what = `${f.count(p.bags, "bag")} to ${p.dropPointName} on ${f.day(p.bringOn)}`;
                return (
                  <li key={p.id} className={`py-2 ${p.status === "cancelled" ? "text-ink-soft" : ""}`}>
                    <strong>{f.count(p.bags, "bag")}</strong> to {p.dropPointName} on {f.day(p.bringOn)}{" "}
                    <span className="text-sm font-semibold">· {past ? "Past its day, not marked" : PLEDGE_STATUS_LABEL[p.status]}</span>
                    {p.status === "received" && p.haulId && haulById.has(p.haulId) ? (
                      <span className="block text-sm text-ink-soft">Brought in by the haul of {haulLabel(haulById.get(p.haulId)!)}</span>
                    ) : null}
                    <span className="block text-sm text-ink-soft">{p.name || "Anonymous"}{p.email ? ` · ${p.email}` : ""}</span>
                    <PledgeMarker id={p.id} status={p.status} label={what} hauls={haulsAt(p.dropPointId)} />
                    <RecordActions kind="pledge" id={p.id} name={`the pledge of ${what}`} archived={false} compact />
                  </li>
                );
              })}
            </ul>
          </>
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
                {r.photoUrl ? <a href={r.photoUrl} className="tap">See the photo</a> : null}
                <RecordActions kind="fillReport" id={r.id} name={`the fill report of ${r.dropPointName}, ${f.moment(r.createdAt)}`} archived={false} compact />
              </li>
            ))}
          </ul>
        )}
      </Card>
      <Card title="Printable signs">
        <ul className="flex flex-col gap-1">
          {points.map((p) => (
            <li key={p.id}>
              <Link href={`/drives/${slug}/sign/${p.id}`} className="tap">Sign for {p.name}</Link>
            </li>
          ))}
        </ul>
      </Card>
    </>
  );
}
