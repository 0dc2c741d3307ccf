import type { Metadata } from "next";
import Link from "next/link";
import { Card, EmptyState } from "@/components/ui/card";
import { ButtonLink } from "@/components/ui/button-link";
import { PageHeading } from "@/components/ui/page-heading";
import { DriveProgressLine } from "@/components/heaters/drive-progress-line";
import { StateBadge } from "@/components/heaters/state-badge";
import { requirePageRole } from "@/lib/auth/session";
import { listDriveTargets } from "@/lib/heaters/drive-targets";
import { formatNumber } from "@/lib/heaters/format";
import { listHeaterUnits } from "@/lib/heaters/queries";
import { heaterClaims } from "@/lib/ledger/balances";
import { countOf } from "@/lib/plural";

export const metadata: Metadata = { title: "Heater units" };

export default async function UnitsPage() {
  const actor = await requirePageRole("/units", "builder", "organiser");
  const [units, drives, claims, archived] = await Promise.all([
    listHeaterUnits(actor.group.id),
    listDriveTargets(actor.group.id),
    heaterClaims(actor.group.id),
    listHeaterUnits(actor.group.id, undefined, true),
  ]);
  return (
    <main className="flex flex-col gap-6">
      <PageHeading title="Heater units">
        <ButtonLink href="/plan">Plan a unit</ButtonLink>
      </PageHeading>
      {units.length === 0 ? (
        <Card>
          <EmptyState title="No heater units yet">Plan one from its glazing sheet to see how many cans it needs.</EmptyState>
        </Card>
      ) : null}
      {drives
        .filter((d) => d.unitCans.length > 0)
        .map((d) => (
          <Card key={d.id} title={d.name}>
            <div className="mb-3">
              <DriveProgressLine drive={d} />
            </div>
            <ul className="divide-y divide-paper-edge">
              {units
                .filter((u) => u.driveId === d.id)
                .map((u) => (
                  <li key={u.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
                    <Link href={`/units/${u.id}`} className="tap font-semibold">
                      {u.name}
                    </Link>
                    <span className="flex flex-wrap items-center gap-3 text-ink-soft">
                      <span>
                        {u.columns} × {u.rows} = {countOf(u.cans, "can", formatNumber)} · {formatNumber(claims[u.id]?.claimed ?? 0)} claimed ·{" "}
                        {formatNumber(claims[u.id]?.builtIn ?? 0)} built in
                      </span>
                      <StateBadge state={u.state} />
                    </span>
                  </li>
                ))}
            </ul>
          </Card>
        ))}
      {archived.length > 0 ? (
        <details className="rounded-lg border-2 border-paper-edge p-3" data-testid="archived-units">
          <summary className="tap cursor-pointer font-semibold">Archived units ({archived.length})</summary>
          <p className="mt-2 text-sm text-ink-soft">Hidden from the lists above and counted toward no target. Open one to restore it.</p>
          <ul className="divide-y divide-paper-edge">
            {archived.map((u) => (
              <li key={u.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
                <Link href={`/units/${u.id}`} className="tap font-semibold">
                  {u.name}
                </Link>
                <span className="text-ink-soft">
                  {u.driveName ?? "No drive"} · {countOf(u.cans, "can", formatNumber)}
                </span>
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </main>
  );
}
