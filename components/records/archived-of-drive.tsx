import { Card, EmptyState } from "@/components/ui/card";
import { LEVEL_LABEL } from "@/lib/drives/fill";
import { formatter, NBSP, type Look } from "@/lib/format";
import type { RecordKind } from "@/lib/records/kinds";
import type { ArchivedOfDrive } from "@/lib/records/types";
import { RecordActions } from "./record-actions";

interface Shelved {
  id: string;
  /** What the row says. */
  text: string;
  /** What its buttons name for a screen reader. */
  name: string;
  photo?: { url: string; alt: string };
}

/** The archived records of one drive as rows, one section per kind, in the order the page lists them. */
function shelves(archived: ArchivedOfDrive, look: Look): { kind: RecordKind; title: string; items: Shelved[]; total: number }[] {
  const f = formatter(look);
  const pledge = (p: ArchivedOfDrive["pledges"][number]) => `${f.count(p.bags, "bag")} to ${p.dropPointName} on ${f.day(p.bringOn)}`;
  const report = (r: ArchivedOfDrive["fillReports"][number]) => `${r.dropPointName}: ${LEVEL_LABEL[r.level] ?? `${r.level}${NBSP}%`}, ${f.moment(r.createdAt)}`;
  return [
    {
      kind: "dropPoint" as const,
      title: "Drop points",
      total: archived.totals.dropPoints,
      items: archived.dropPoints.map((p) => ({ id: p.id, text: p.address ? `${p.name} · ${p.address}` : p.name, name: `the drop point ${p.name}` })),
    },
    {
      kind: "pledge" as const,
      title: "Pledges",
      total: archived.totals.pledges,
      items: archived.pledges.map((p) => ({ id: p.id, text: `${pledge(p)} · ${p.name || "Anonymous"}`, name: `the pledge of ${pledge(p)}` })),
    },
    {
      kind: "fillReport" as const,
      title: "Fill reports",
      total: archived.totals.fillReports,
      items: archived.fillReports.map((r) => ({ id: r.id, text: report(r), name: `the fill report ${report(r)}` })),
    },
    {
      kind: "photo" as const,
      title: "Photos",
      total: archived.totals.photos,
      items: archived.photos.map((p, i) => {
        const of = p.of === "fillReport" ? `a fill report at ${p.dropPointName}` : `the bin at ${p.dropPointName}`;
        const text = p.of === "fillReport" ? `Fill report photo · ${p.dropPointName}` : p.dropPointName;
        return { id: p.id, text, name: `archived photo ${i + 1}, of ${of}`, photo: { url: p.url, alt: `Archived photo of ${of}` } };
      }),
    },
  ].filter((s) => s.total > 0);
}

/**
 * The drive's "archived" view (issue 16): what was archived, hidden from the lists
 * and the public, each with Restore and (once asked) Delete.
 */
export function ArchivedOfDriveCard({ archived, look }: { archived: ArchivedOfDrive; look: Look }) {
  const sections = shelves(archived, look);
  const total = sections.reduce((n, s) => n + s.total, 0);
  const f = formatter(look);
  return (
    <Card title={`Archived (${total})`}>
      {total === 0 ? (
        <EmptyState title="Nothing archived">Archived drop points, pledges, fill reports and photos wait here, hidden from the lists and the public, until you restore them.</EmptyState>
      ) : (
        <div className="flex flex-col gap-4" data-testid="archived-of-drive">
          <p className="text-ink-soft">Hidden from the lists and the public page. Restore one to bring it back; only what the ledger never refers to can be deleted.</p>
          {sections.map((s) => (
            <section key={s.kind} aria-labelledby={`archived-${s.kind}`}>
              <h3 id={`archived-${s.kind}`} className="text-lg">{s.title}</h3>
              {s.items.length < s.total ? (
                <p className="text-sm text-ink-soft" data-testid={`archived-${s.kind}-shown`}>
                  Showing {f.number(s.items.length)} of {f.number(s.total)}, the newest first. Restore or delete some to see the rest.
                </p>
              ) : null}
              <ul className="divide-y divide-paper-edge" aria-label={`Archived ${s.title.toLowerCase()}`}>
                {s.items.map((item) => (
                  <li key={item.id} className="py-2">
                    {item.photo ? (
                      <figure className="flex flex-col gap-1">
                        {/* eslint-disable-next-line @next/next/no-img-element -- photos come from the upload host at their own size; next/image would proxy them through the app */}
                        <img src={item.photo.url} alt={item.photo.alt} className="h-24 w-fit rounded-lg border border-paper-edge" />
                        <figcaption className="text-sm text-ink-soft">{item.text}</figcaption>
                      </figure>
                    ) : (
                      <span>{item.text}</span>
                    )}
                    <RecordActions kind={s.kind} id={item.id} name={item.name} archived compact />
                  </li>
                ))}
              </ul>
            </section>
          ))}
        </div>
      )}
    </Card>
  );
}
