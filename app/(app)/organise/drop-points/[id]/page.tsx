import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DropPointEdit } from "@/components/drives/organise/drop-point-edit";
import { PhotoUploader } from "@/components/drives/organise/photo-uploader";
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
        <p><Link href={`/organise/drives/${point.driveId}`}>← {drive?.name ?? "Drive"}</Link></p>
        <h1 className="text-3xl">{point.name}</h1>
        {drive ? <p><Link href={`/drives/${drive.slug}/sign/${point.id}`}>Print a sign for this drop point</Link></p> : null}
      </div>
      <Card title="Photos">
        {photos.length ? (
          <div className="mb-3 flex flex-wrap gap-2">
            {photos.map((p) => (
              // eslint-disable-next-line @next/next/no-img-element -- photos come from the upload host at their own size; next/image would proxy them through the app
              <img key={p.id} src={p.url} alt={`Photo of the bin at ${point.name}`} className="h-32 w-auto rounded-lg border border-paper-edge" />
            ))}
          </div>
        ) : (
          <p className="mb-3 text-ink-soft">No photos yet.</p>
        )}
        <PhotoUploader dropPointId={point.id} />
      </Card>
      <Card title="Details">
        <DropPointEdit point={point} tileUrl={tiles.tileUrl} attribution={tiles.attribution} />
      </Card>
    </main>
  );
}
