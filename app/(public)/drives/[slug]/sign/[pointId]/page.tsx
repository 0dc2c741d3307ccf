import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import QRCode from "qrcode";
import { PrintButton } from "@/components/drives/public/print-button";
import { NOT_WANTED, WANTED } from "@/components/drives/public/wanted-cans";
import { findPublicDrive, findPublicDropPoint } from "@/lib/drives/public-queries";
import { wantedExtra } from "@/lib/drives/wanted";
import { binPagePath } from "@/lib/drives/bin-page";
import { UUID } from "@/lib/api/path";
import { env } from "@/lib/env";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Printable sign" };

// One sheet in portrait with 12 mm margins: the sign fills what is left of
// A4 (210 × 297 mm) or US Letter (215.9 × 279.4 mm), a little under, so
// rounding never spills it onto a second page. Its box clips, so it keeps
// 2 mm inside each side: a large letter's overhang is never cut off.
const PAPER = {
  a4: { css: "A4", width: "186mm", height: "270mm" },
  letter: { css: "letter", width: "190mm", height: "252mm" },
} as const;

export default async function SignPage({ params, searchParams }: { params: Promise<{ slug: string; pointId: string }>; searchParams: Promise<{ paper?: string }> }) {
  const { slug, pointId } = await params;
  const paper = (await searchParams).paper === "letter" ? "letter" : "a4";
  const drive = await findPublicDrive(slug);
  if (!drive || !UUID.test(pointId)) notFound();
  const point = await findPublicDropPoint(drive.id, pointId);
  if (!point) notFound();
  const url = `${env().APP_URL.replace(/\/+$/, "")}${binPagePath(drive.slug, point.id)}`;
  const qr = await QRCode.toString(url, { type: "svg", errorCorrectionLevel: "M", margin: 2 });
  const note = drive.wanted ? wantedExtra(drive.wanted, [...WANTED, ...NOT_WANTED]) : "";
  const size = PAPER[paper];
  return (
    <main id="main" className="sign-page mx-auto max-w-3xl px-4 py-6 print:max-w-none print:p-0">
      <style>{`@page { size: ${size.css} portrait; margin: 12mm; }
        @media print {
          header, footer, .no-print { display: none !important; }
          html, body { background: #fff !important; }
          .sign { border: none !important; box-shadow: none !important; padding: 0 2mm !important; width: ${size.width}; height: ${size.height};
                  overflow: hidden; break-inside: avoid; font-size: 17pt; gap: 6mm !important; }
          .sign h1 { font-size: 36pt; }
          .sign .sign-point { font-size: ${point.name.length > 50 ? 18 : 24}pt; }
          .sign .sign-qr { width: 72mm; height: 72mm; }
        }`}</style>
      <div className="no-print mb-4 flex flex-wrap items-center gap-3">
        <span className="font-semibold">Paper:</span>
        <Link href={`?paper=a4`} aria-current={paper === "a4" ? "page" : undefined}>A4</Link>
        <Link href={`?paper=letter`} aria-current={paper === "letter" ? "page" : undefined}>US Letter</Link>
        <PrintButton />
      </div>
      <article className="sign flex flex-col gap-5 rounded-card border-2 border-ink bg-white p-6 text-lg text-ink" aria-label={`Sign for ${point.name}`}>
        <p className="text-xl font-semibold text-ember-deep [overflow-wrap:anywhere]">{drive.groupName}</p>
        <h1 className="text-4xl leading-tight [overflow-wrap:anywhere]">Empty cans here, please</h1>
        <p className="sign-point text-2xl leading-snug [overflow-wrap:anywhere]">
          <strong>{point.name}</strong> · {drive.name}
          <br />
          Open: <strong>{point.hours || "ask inside"}</strong>
        </p>
        <div className="grid grid-cols-2 gap-6">
          <div>
            <h2 className="text-2xl text-moss-deep">Yes, please</h2>
            <ul className="list-disc pl-6">{WANTED.map((w) => <li key={w}>{w}</li>)}</ul>
            {note ? <p className="mt-2 [overflow-wrap:anywhere]">{note}</p> : null}
          </div>
          <div>
            <h2 className="text-2xl text-alarm">No, thank you</h2>
            <ul className="list-disc pl-6">{NOT_WANTED.map((w) => <li key={w}>{w}</li>)}</ul>
          </div>
        </div>
        <div className="flex flex-row items-center gap-6">
          <div className="sign-qr h-48 w-48 shrink-0" role="img" aria-label={`QR code linking to ${url}`} data-qr-text={url} dangerouslySetInnerHTML={{ __html: qr }} />
          <p>
            <strong className="block text-2xl">Bin full? Scan and tap once.</strong>
            The code opens this bin&apos;s own page: tell the organisers it needs emptying, see when it is open, and find the other drop points.
            <span className="mt-1 block break-all text-base font-semibold">{url}</span>
          </p>
        </div>
        <div className="mt-auto border-t-2 border-ink pt-3 text-base" data-testid="sign-safety">
          <p className="font-bold">Take care</p>
          <p>
            Cut and torn can edges are sharp: carry bags by their handles, wear gloves to sort, and never push cans down into a full bin
            by hand — if it is full, leave the bag beside it only where the host allows, or bring it another day.
          </p>
        </div>
      </article>
    </main>
  );
}
