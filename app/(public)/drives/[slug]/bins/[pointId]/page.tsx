import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { BinQuickReport } from "@/components/drives/public/bin-quick-report";
import { PointLinks } from "@/components/drives/public/point-links";
import { CanSafetyNote } from "@/components/drives/public/wanted-cans";
import { AppError } from "@/lib/api/errors";
import { FILL_SHAPE_LABEL, fillShape, LEVEL_LABEL } from "@/lib/drives/fill";
import { publicDriveTimeZone } from "@/lib/drives/public-queries";
import { publicDrive, publicDropPoints } from "@/lib/drives/public-service";
import { formatDateTime } from "@/lib/format";

export const dynamic = "force-dynamic";
// No loading.tsx: an unknown drive or drop point must answer 404, not a streamed 200.

type Props = { params: Promise<{ slug: string; pointId: string }> };

async function load(slug: string, pointId: string) {
  try {
    const [drive, points, timeZone] = await Promise.all([publicDrive(slug), publicDropPoints(slug), publicDriveTimeZone(slug)]);
    const point = points.find((p) => p.id === pointId);
    if (!point) notFound();
    return { drive, point, timeZone };
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug, pointId } = await params;
  const points = await publicDropPoints(slug).catch(() => []);
  const point = points.find((p) => p.id === pointId);
  return { title: point ? `Bin at ${point.name}` : "Bin not found" };
}

/** A drop point's own page, where its sign's QR code leads: how full the bin is, and one tap to say so. */
export default async function BinPage({ params }: Props) {
  const { slug, pointId } = await params;
  const { drive, point, timeZone } = await load(slug, pointId);
  const shape = fillShape(point.fill?.level);
  return (
    <main id="main" className="mx-auto flex max-w-xl flex-col gap-5 px-4 py-6">
      <header>
        <p className="font-semibold text-ember-deep [overflow-wrap:anywhere]">{drive.drive.name}</p>
        <h1 className="text-3xl [overflow-wrap:anywhere]">Can bin at {point.name}</h1>
        {point.address ? <p className="mt-1 [overflow-wrap:anywhere]">{point.address}</p> : null}
        <p className="mt-1">
          <span className="font-semibold">Open:</span> {point.hours || "Ask the organisers"}
        </p>
      </header>
      <section aria-labelledby="full-heading" className="rounded-card border-2 border-ember bg-white/70 p-4">
        <h2 id="full-heading" className="text-2xl">
          Is this bin full?
        </h2>
        <p className="mb-3 text-ink-soft" data-testid="fill" data-fill={shape}>
          Last report: {FILL_SHAPE_LABEL[shape]}
          {point.fill ? ` — ${LEVEL_LABEL[point.fill.level] ?? `${point.fill.level} %`} (${formatDateTime(point.fill.reportedAt, timeZone)})` : " since the last pickup"}.
        </p>
        <BinQuickReport slug={slug} pointId={point.id} pointName={point.name} />
      </section>
      <CanSafetyNote />
      <PointLinks slug={slug} point={point} onBinPage />
      <p>
        <Link href={`/drives/${slug}`}>All drop points of {drive.drive.name}, on the map</Link>
      </p>
    </main>
  );
}
