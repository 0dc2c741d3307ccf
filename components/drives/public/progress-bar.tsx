import type { PublicDriveView } from "@/lib/drives/types";
import { NO_HEATERS, remainingText } from "@/lib/drives/progress-wording";
import { countOf, noun, plural } from "@/lib/plural";

const fmt = (n: number) => n.toLocaleString("en-GB");

export function DriveProgressBar({ data }: { data: PublicDriveView }) {
  const { target, progress } = data;
  const share = target.cans > 0 ? Math.min(1, progress.goodCans / target.cans) : 0;
  const hasTarget = target.heaters > 0 && target.cans > 0;
  return (
    <div>
      {hasTarget ? (
        <p className="text-lg">
          <strong>{fmt(progress.goodCans)}</strong> good {plural(progress.goodCans, "can")} of <strong>{fmt(target.cans)}</strong> needed —{" "}
          <strong>
            good cans for {fmt(progress.heatersCovered)} of {countOf(target.heaters, "heater", fmt)}
          </strong>
        </p>
      ) : (
        <p className="text-lg">
          <strong>{NO_HEATERS}.</strong> {countOf(progress.goodCans, "good can", fmt)} counted so far.
        </p>
      )}
      {hasTarget ? (
        <div
          role="progressbar"
          aria-label="Good cans counted against the target"
          aria-valuemin={0}
          aria-valuemax={target.cans}
          aria-valuenow={progress.goodCans}
          className="mt-2 h-4 overflow-hidden rounded-full bg-paper-deep"
        >
          <div className="h-full bg-moss" style={{ width: `${(share * 100).toFixed(1)}%` }} />
        </div>
      ) : null}
      <p className="mt-2 text-sm text-ink-soft">
        {progress.estimatedUnsorted > 0
          ? `About ${fmt(progress.estimatedUnsorted)} more likely good ${plural(progress.estimatedUnsorted, noun("can is", "cans are"))} in bags not yet sorted. `
          : ""}
        {remainingText(target, progress.remaining)}
      </p>
    </div>
  );
}
