import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import QRCode from "qrcode";
import { PrintButton } from "@/components/drives/public/print-button";
import { NOT_WANTED, WANTED } from "@/components/drives/public/wanted-cans";
import { findPublicDrive, findPublicDropPoint } from "@/lib/drives/public-queries";
import { UUID } from "@/lib/api/path";
import { env } from "@/lib/env";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Printable sign" };

// Sizes that fit both A4 (210 × 297 mm) and US Letter (215.9 × 279.4 mm) inside 12 mm margins.
const PAPER = { a4: "A4", letter: "letter" } as const;

export default async function SignPage({ params, searchParams }: { params: Promise<{ slug: string; pointId: string }>; searchParams: Promise<{ paper?: string }> }) {
  const { slug, pointId } = await params;
  const paper = (await searchParams).paper === "letter" ? "letter" : "a4";
  const drive = await findPublicDrive(slug);
  if (!drive || !UUID.test(pointId)) notFound();
  const point = await findPublicDropPoint(drive.id, pointId);
  if (!point) notFound();
  const url = `${env().APP_URL}/drives/${drive.slug}`;
  const qr = await QRCode.toString(url, { type: "svg", errorCorrectionLevel: "M", margin: 1 });
  return (
    <main id="main" className="sign-page mx-auto max-w-3xl px-4 py-6 print:p-0">
      <style>{`@page { size: ${PAPER[paper]} portrait; margin: 12mm; }
        @media print { header, footer, .no-print { display: none !important; } .sign { border: none !important; box-shadow: none !important; width: 186mm; min-height: 250mm; } }`}</style>
      <div className="no-print mb-4 flex flex-wrap items-center gap-3">
        <span className="font-semibold">Paper:</span>
        <Link href={`?paper=a4`} aria-current={paper === "a4" ? "page" : undefined}>A4</Link>
        <Link href={`?paper=letter`} aria-current={paper === "letter" ? "page" : undefined}>US Letter</Link>
        <PrintButton />
      </div>
      <article className="sign flex flex-col gap-5 rounded-card border-2 border-ink bg-white p-6 text-ink" aria-label={`Sign for ${point.name}`}>
        <p className="text-xl font-semibold text-ember-deep">{drive.groupName}</p>
        <h1 className="text-4xl leading-tight">{drive.name}</h1>
        <p className="text-2xl">
          Can drop point: <strong>{point.name}</strong>
        </p>
        <p className="text-xl">
          Open: <strong>{point.hours || "ask inside"}</strong>
        </p>
        <div className="grid grid-cols-2 gap-6 text-lg">
          <div>
            <h2 className="text-2xl text-moss-deep">Yes, please</h2>
            <ul className="list-disc pl-6">{WANTED.map((w) => <li key={w}>{w}</li>)}</ul>
            {drive.wanted ? <p className="mt-2">{drive.wanted}</p> : null}
          </div>
          <div>
            <h2 className="text-2xl text-alarm">No, thank you</h2>
            <ul className="list-disc pl-6">{NOT_WANTED.map((w) => <li key={w}>{w}</li>)}</ul>
          </div>
        </div>
        <div className="flex flex-col items-start gap-6 sm:flex-row sm:items-center print:flex-row print:items-center">
          <div className="h-44 w-44 shrink-0" role="img" aria-label={`QR code linking to ${url}`} dangerouslySetInnerHTML={{ __html: qr }} />
          <p className="text-lg">
            Scan for the map of all drop points, how far the drive has come, and to tell us when this bin is full.
            <span className="mt-1 block break-all font-semibold">{url}</span>
          </p>
        </div>
        <p className="text-base">Mind the sharp edges: please do not push cans down into a full bin by hand.</p>
      </article>
    </main>
  );
}
