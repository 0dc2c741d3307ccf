import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DriveForm } from "@/components/drives/organise/drive-form";
import { DropPointsEditor } from "@/components/drives/organise/drop-points-editor";
import { PledgesAndReports } from "@/components/drives/organise/pledges-and-reports";
import { ArchivedOfDriveCard } from "@/components/records/archived-of-drive";
import { ArchiveCard, ArchivedNote } from "@/components/records/archive-card";
import { Card } from "@/components/ui/card";
import { requirePageRole } from "@/lib/auth/session";
import { db } from "@/lib/db";
import { groupToday } from "@/lib/drives/current-drive-queries";
import { findDrive, listDropPoints, listFillReports, listPledgeHauls, listPledges } from "@/lib/drives/queries";
import { tileConfig } from "@/lib/map/config";
import { groupLook } from "@/lib/format/group-look-queries";
import { listArchivedOfDrive } from "@/lib/records/queries";

export const metadata: Metadata = { title: "Drive" };

export default async function EditDrivePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageRole(`/organise/drives/${id}`, "organiser");
  const drive = await findDrive(actor.group.id, id);
  if (!drive) notFound();
  const [points, pledges, hauls, reports, group, look, today, archived] = await Promise.all([
    listDropPoints(actor.group.id, drive.id),
    listPledges(actor.group.id, drive.id),
    listPledgeHauls(actor.group.id, drive.id),
    listFillReports(actor.group.id, drive.id),
    db("groups").select("workshop_lat as lat", "workshop_lng as lng").where({ id: actor.group.id }).first(),
    groupLook(actor.group.id),
    groupToday(actor.group.id),
    listArchivedOfDrive(actor.group.id, drive.id),
  ]);
  const centre = points.length
    ? { lat: points.reduce((s, p) => s + p.lat, 0) / points.length, lng: points.reduce((s, p) => s + p.lng, 0) / points.length }
    : { lat: group?.lat ?? 47.2, lng: group?.lng ?? -8.0 };
  const tiles = tileConfig();
  return (
    <main className="flex flex-col gap-6">
      <div>
        <p><Link href="/organise/drives" className="tap">← All drives</Link></p>
        <h1 className="text-3xl">{drive.name}</h1>
        {drive.archivedAt ? (
          <ArchivedNote>Archived: this drive is hidden from the lists, the entry forms and the public. Restore it at the foot of this page.</ArchivedNote>
        ) : drive.isPublic ? (
          <p><Link href={`/drives/${drive.slug}`} className="tap">Open the public page</Link></p>
        ) : (
          <p className="text-ink-faint">Not public</p>
        )}
      </div>
      <Card title="Drop points">
        <DropPointsEditor driveId={drive.id} points={points} centre={centre} tileUrl={tiles.tileUrl} attribution={tiles.attribution} />
      </Card>
      <PledgesAndReports pledges={pledges} hauls={hauls} reports={reports} points={points} slug={drive.slug} look={look} today={today} />
      <ArchivedOfDriveCard archived={archived} look={look} />
      <Card title="Drive details">
        <DriveForm driveId={drive.id} initial={{ ...drive }} />
      </Card>
      <ArchiveCard
        kind="drive"
        id={drive.id}
        name={`the drive ${drive.name}`}
        archived={drive.archivedAt !== null}
        afterDelete="/organise/drives"
        text={{
          active: "Archiving hides the drive from the lists, the entry forms and the public without losing anything; the ledger keeps every line.",
          archived: "Restore it to bring it back to the lists and, if public, to its public page. A drive can be deleted only while the ledger holds nothing for it and no pickup run is planned on it.",
        }}
      />
    </main>
  );
}
