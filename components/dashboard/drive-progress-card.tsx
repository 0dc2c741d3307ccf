import Link from "next/link";
import { Card } from "@/components/ui/card";
import type { FullBin } from "@/lib/drives/types";
import { FullBins } from "./full-bins";
import type { DriveProgress } from "@/lib/drives/progress";
import { finishText, heatersCoveredText, paceText } from "@/lib/drives/progress-wording";
import { countOf } from "@/lib/plural";
import { spanText } from "@/lib/drives/current-drive";
import { formatter, type Look } from "@/lib/format";

interface Props {
  drive: { id: string; slug: string; name: string; startsOn: string; endsOn: string; isPublic: boolean; dropPoints: number; heaterUnits: number };
  progress: DriveProgress;
  fullBins: FullBin[];
  pledges: { id: string; bags: number; bringOn: string | null; dropPointName: string }[];
}


export function DriveProgressCard({ drive, progress, fullBins, pledges, look }: Props & { look: Look }) {
  const f = formatter(look);
  const fmt = (n: number) => f.number(n);
  const share = progress.target.cans > 0 ? Math.min(1, progress.goodCans / progress.target.cans) : 0;
  return (
    <Card
      title={
        <span className="flex flex-wrap items-baseline justify-between gap-2">
          <Link href={`/organise/drives/${drive.id}`} className="tap">{drive.name}</Link>
          <span className="text-base font-normal text-ink-faint">
            {spanText(drive, look)}
            {drive.isPublic ? (
              <>
                {" "}
                · <Link href={`/drives/${drive.slug}`}>public page</Link>
              </>
            ) : (
              " · not public"
            )}
          </span>
        </span>
      }
    >
      <p className="text-lg font-semibold" data-testid="heaters-covered">
        {heatersCoveredText(progress.heatersCovered.covered, progress.heatersCovered.total)}
      </p>
      <div className="mt-2 h-4 overflow-hidden rounded-full bg-paper-deep" role="img" aria-label={progress.target.cans > 0 ? `${f.percent(share)} of the target` : "No target yet"}>
        <div className="h-full bg-moss" style={{ width: `${share * 100}%` }} />
      </div>
      <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-4">
        <div>
          <dt className="text-ink-faint">Good cans</dt>
          <dd className="font-semibold">
            {fmt(progress.goodCans)} / {fmt(progress.target.cans)}
          </dd>
        </div>
        <div>
          <dt className="text-ink-faint">Unsorted (estimate)</dt>
          <dd className="font-semibold">≈ {fmt(progress.estimatedUnsorted)}</dd>
        </div>
        <div>
          <dt className="text-ink-faint">Yield</dt>
          <dd className="font-semibold">
            {f.percent(progress.yield)}{progress.yieldSource === "default" ? " (assumed until the first sort)" : ""}
          </dd>
        </div>
        <div>
          <dt className="text-ink-faint">{progress.finish.kind === "expected" ? "Expected finish" : "Finish"}</dt>
          <dd className="font-semibold" data-testid="expected-finish">
            {finishText(progress.finish, f.day)}
          </dd>
        </div>
      </dl>
      <p className="mt-2 text-sm text-ink-faint">
        {countOf(drive.dropPoints, "drop point", fmt)} · {countOf(drive.heaterUnits, "heater unit", fmt)} · {paceText(progress.pace)}
      </p>
      <FullBins bins={fullBins} />
      {pledges.length > 0 ? (
        <div className="mt-4">
          <p className="font-semibold">Pledged bags coming</p>
          <ul className="text-sm text-ink-soft">
            {pledges.map((p) => (
              <li key={p.id}>
                about {countOf(p.bags, "bag", fmt)} to {p.dropPointName}
                {p.bringOn ? ` on ${f.day(p.bringOn)}` : ""}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </Card>
  );
}
