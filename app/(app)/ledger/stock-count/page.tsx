import type { Metadata } from "next";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { StockCountForm } from "@/components/ledger/stock-count-form";
import { DriveBanner } from "@/components/drives/drive-banner";
import { DriveLinks } from "@/components/drives/drive-links";
import { requirePageRole } from "@/lib/auth/session";
import { pageDrive } from "@/lib/drives/current-drive-queries";
import { listLogDrives } from "@/lib/drives/queries";
import { groupLook } from "@/lib/format/group-look-queries";

export const metadata: Metadata = { title: "Stock count" };

export default async function StockCountPage({ searchParams }: { searchParams: Promise<{ drive?: string }> }) {
  const actor = await requirePageRole("/ledger/stock-count", "organiser");
  const { drive: wanted } = await searchParams;
  const [drives, look] = await Promise.all([listLogDrives(actor.group.id), groupLook(actor.group.id)]);
  const { drive, today } = await pageDrive(actor, drives, wanted);
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-5">
      <p>
        <a href={drive ? `/ledger?drive=${drive.id}` : "/ledger"} className="tap">← Ledger</a>
      </p>
      <h1 className="text-3xl">Stock count{drive ? ` · ${drive.name}` : ""}</h1>
      {!drive ? (
        <EmptyState title="No drives yet">Set up a drive; then you can count what is on hand for it.</EmptyState>
      ) : (
        <>
          {drives.length > 1 ? (
            <DriveLinks drives={drives} currentId={drive.id} path="/ledger/stock-count" param="drive" />
          ) : null}
          <DriveBanner drive={drive} today={today} lead="Counting for" look={look} />
          <p className="text-ink-soft">
            Count the cans in each box or bag and type what is really there. The differences from the running totals are posted as one
            adjustment entry with your reason, and can be undone like any other entry. Hauled cans (an estimate until sorted), claimed and
            built-in cans are not counted here.
          </p>
          <Notice tone="caution" title="Counting means handling cut cans">
            Opened and punched cans have razor edges: wear cut-resistant gloves and count them in their crates rather than by hand.
          </Notice>
          <Card title="What is on hand">
            <StockCountForm key={drive.id} driveId={drive.id} />
          </Card>
        </>
      )}
    </main>
  );
}
