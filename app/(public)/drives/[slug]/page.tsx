import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { DriveLive } from "@/components/drives/public/drive-live";
import { PointLinks } from "@/components/drives/public/point-links";
import { CanSafetyNote, WantedCans } from "@/components/drives/public/wanted-cans";
import { Card } from "@/components/ui/card";
import { AppError } from "@/lib/api/errors";
import { publicDrive, publicDriveLook, publicDropPoints } from "@/lib/drives/public-service";
import { formatLongDay } from "@/lib/format/dates";
import { tileConfig } from "@/lib/map/config";

export const dynamic = "force-dynamic";
// No loading.tsx for this segment: a streamed placeholder would fix the status
// at 200 before notFound() runs, and an unknown or private drive must be a 404.

type Props = { params: Promise<{ slug: string }>; searchParams?: Promise<{ point?: string | string[] }> };

async function load(slug: string) {
  try {
    const readAt = new Date().getTime();
    return [...(await Promise.all([publicDrive(slug), publicDropPoints(slug), publicDriveLook(slug)])), readAt] as const;
  } catch (error) {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { slug } = await params;
  try {
    return { title: (await publicDrive(slug)).drive.name };
  } catch {
    return { title: "Drive not found" };
  }
}

export default async function PublicDrivePage({ params, searchParams }: Props) {
  const { slug } = await params;
  const [drive, points, look, readAt] = await load(slug);
  const tiles = tileConfig();
  // "Pledge cans here" links carry ?point=<id>; anything not one of this drive's points is ignored.
  const asked = (await searchParams)?.point;
  const pledgePoint = points.find((p) => p.id === (Array.isArray(asked) ? asked[0] : asked))?.id ?? "";
  const pointLinks = Object.fromEntries(points.map((p) => [p.id, <PointLinks key={p.id} slug={slug} point={p} />]));
  return (
    <main id="main" className="mx-auto flex max-w-5xl flex-col gap-6 px-4 py-6">
      <header>
        <p className="font-semibold text-ember-deep">{drive.drive.groupName}</p>
        <h1 className="text-3xl [overflow-wrap:anywhere] sm:text-4xl">{drive.drive.name}</h1>
        <p className="mt-1 text-ink-soft">
          {formatLongDay(drive.drive.startsOn, look)} to {formatLongDay(drive.drive.endsOn, look)}
        </p>
        {drive.drive.description ? <p className="mt-3 max-w-prose text-lg [overflow-wrap:anywhere]">{drive.drive.description}</p> : null}
      </header>
      <Card title="Which cans we need">
        <WantedCans extra={drive.drive.wanted} />
        <div className="mt-3">
          <CanSafetyNote />
        </div>
      </Card>
      <DriveLive
        slug={slug}
        initialDrive={drive}
        initialPoints={points}
        tileUrl={tiles.tileUrl}
        attribution={tiles.attribution}
        pointLinks={pointLinks}
        pledgePoint={pledgePoint}
        readAt={readAt}
        timeZone={look.timeZone}
      />
    </main>
  );
}
