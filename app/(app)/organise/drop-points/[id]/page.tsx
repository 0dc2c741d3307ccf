import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DropPointEdit } from "@/components/drives/organise/drop-point-edit";
import { PhotoUploader } from "@/components/drives/organise/photo-uploader";
import { ArchiveCard, ArchivedNote } from "@/components/records/archive-card";
import { RecordActions } from "@/components/records/record-actions";
import { Card } from "@/components/ui/card";
import { requirePageRole } from "@/lib/auth/session";
import { findDrive, findDropPoint, listDropPointPhotos } from "@/lib/drives/queries";
import { tileConfig } from "@/lib/map/config";

export const metadata: Metadata = { title: "Drop point" };

export default async function DropPointPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requirePageRole(`/organise/drop-points/${id}`, "organiser");
  const point = await findDropPoint(actor.group.id, id);
  if (!point) notFound();
  const [drive, photos] = await Promise.all([findDrive(actor.group.id, point.driveId), listDropPointPhotos(actor.group.id, point.id)]);
  const tiles = tileConfig();
  return (
    <main className="flex flex-col gap-6">
      <div>
        <p><Link href={`/organise/drives/${point.driveId}`} className="tap">← {drive?.name ?? "Drive"}</Link></p>
        <h1 className="text-3xl">{point.name}</h1>
        {drive ? <p><Link href={`/drives/${drive.slug}/sign/${point.id}`} className="tap">Print a sign for this drop point</Link></p> : null}
        {point.archivedAt ? (
          <ArchivedNote>Archived: hidden from the drive&apos;s list, the entry forms and the public map. Restore it at the foot of this page.</ArchivedNote>
        ) : null}
      </div>
      <Card title="Photos">
        {photos.length ? (
          <ul className="mb-3 flex flex-wrap gap-3" aria-label="Photos of this drop point">
            {photos.map((p, i) => (
              <li key={p.id} className="flex flex-col gap-1">
                {/* eslint-disable-next-line @next/next/no-img-element -- photos come from the upload host at their own size; next/image would proxy them through the app */}
                <img src={p.url} alt={`Photo of the bin at ${point.name}`} className="h-32 w-auto rounded-lg border border-paper-edge" />
                <RecordActions kind="photo" id={p.id} name={`photo ${i + 1} of ${point.name}`} archived={false} compact />
              </li>
            ))}
          </ul>
        ) : (
          <p className="mb-3 text-ink-soft">No photos yet.</p>
        )}
        <PhotoUploader dropPointId={point.id} />
      </Card>
      <Card title="Details">
        <DropPointEdit point={point} tileUrl={tiles.tileUrl} attribution={tiles.attribution} />
      </Card>
      <ArchiveCard
        kind="dropPoint"
        id={point.id}
        name={`the drop point ${point.name}`}
        archived={point.archivedAt !== null}
        afterDelete={`/organise/drives/${point.driveId}`}
        text={{
          active: "Archiving takes it off the drive's list, the entry forms and the public map without losing anything; its hauls stay in the ledger. Archived photos and reports are listed on the drive's page.",
          archived: "Restore it to put it back on the drive's list and the public map. It can be deleted only while no haul, ledger line or pickup run refers to it.",
        }}
      />
    </main>
  );
}
