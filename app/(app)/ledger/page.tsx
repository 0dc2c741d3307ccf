import type { Metadata } from "next";
import { Card, EmptyState } from "@/components/ui/card";
import { GoodCansChart, YieldChart } from "@/components/ledger/ledger-charts";
import { LedgerTable } from "@/components/ledger/ledger-table";
import { RecyclingForm } from "@/components/ledger/recycling-form";
import { DriveBanner } from "@/components/drives/drive-banner";
import { DriveLinks } from "@/components/drives/drive-links";
import { requirePageRole } from "@/lib/auth/session";
import { pageDrive } from "@/lib/drives/current-drive-queries";
import { driveTarget } from "@/lib/drives/progress";
import { driveGoodDaily, dropPointTallies } from "@/lib/ledger/balances";
import { driveChartBasics } from "@/lib/ledger/queries";
import { listGroupPeople } from "@/lib/accounts/queries";
import { listLogDrives } from "@/lib/drives/queries";
import { dailySeries } from "@/lib/ledger/daily-series";
import { groupLook } from "@/lib/format/group-look-queries";
import { countOf } from "@/lib/plural";
import { NO_HEATERS } from "@/lib/drives/progress-wording";

export const metadata: Metadata = { title: "Ledger" };

export default async function LedgerPage({ searchParams }: { searchParams: Promise<{ drive?: string; driveId?: string }> }) {
  const actor = await requirePageRole("/ledger", "organiser");
  // ?driveId= is the table's filter (kept in the address); ?drive= is the older link form.
  const { drive: oldLink, driveId } = await searchParams;
  const wanted = driveId ?? oldLink;
  const [drives, people, look] = await Promise.all([listLogDrives(actor.group.id), listGroupPeople(actor.group.id), groupLook(actor.group.id)]);
  // The address wins (links, the table's filter); else the remembered drive, else the one running today.
  const { drive, today } = await pageDrive(actor, drives, wanted);
  if (!drive) {
    return (
      <main className="flex flex-col gap-4">
        <h1 className="text-3xl">Ledger</h1>
        <EmptyState title="No drives yet">Set up a drive; every can logged for it shows here.</EmptyState>
      </main>
    );
  }
  const basics = await driveChartBasics(actor.group.id, drive.id);
  const [daily, tallies] = await Promise.all([driveGoodDaily(drive.id, basics.startsOn), dropPointTallies(drive.id)]);
  const target = driveTarget(basics.unitCans, basics.sparePercent);
  const dailyPoints = dailySeries(daily, basics.startsOn, today < basics.endsOn ? today : basics.endsOn);
  const names = new Map(drive.dropPoints.map((p) => [p.id, p.name]));
  const yieldPoints = Object.entries(tallies).map(([id, t]) => {
    const counted = t.goodCans + t.rejectedCans;
    return { name: names.get(id) ?? "Drop point", counted, yieldPercent: counted ? Math.round((t.goodCans / counted) * 1000) / 10 : 0 };
  });

  return (
    <main className="flex flex-col gap-5">
      <h1 className="text-3xl">Ledger</h1>
      <DriveLinks drives={drives} currentId={drive.id} path="/ledger" param="driveId" />
      <DriveBanner drive={drive} today={today} lead="Entering for" look={look} />
      <div className="grid gap-5 lg:grid-cols-2">
        <Card title={`Good cans per day · ${drive.name}`}>
          <GoodCansChart daily={dailyPoints} target={target.cans} look={look} />
          <p className="mt-2 text-sm text-ink-soft">
            {target.heaters > 0
              ? `Target ${countOf(target.cans, "can")}: ${target.heaterCans} for ${countOf(target.heaters, "heater unit")} plus ${target.spare} spare.`
              : `${NO_HEATERS}, so the drive has no target yet.`}
          </p>
        </Card>
        <Card title="Yield per drop point">
          <YieldChart points={yieldPoints} />
        </Card>
      </div>
      <p>
        <a href={`/ledger/stock-count?drive=${drive.id}`} className="tap">Count what is on hand (stock count)</a>
      </p>
      <Card title="Rejects taken to recycling">
        <RecyclingForm driveId={drive.id} />
      </Card>
      <Card title="Every line">
        <LedgerTable drives={drives} people={people} initialDriveId={drive.id} />
      </Card>
    </main>
  );
}
