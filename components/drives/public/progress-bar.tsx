import type { PublicDriveView } from "@/lib/drives/query-options";

export function DriveProgressBar({ data }: { data: PublicDriveView }) {
  const { target, progress } = data;
  const share = target.cans > 0 ? Math.min(1, progress.goodCans / target.cans) : 0;
  return (
    <div>
      <p className="text-lg">
        <strong>{progress.goodCans.toLocaleString("en-GB")}</strong> good cans of{" "}
        <strong>{target.cans.toLocaleString("en-GB")}</strong> needed —{" "}
        <strong>
          good cans for {progress.heatersCovered} of {target.heaters} heater{target.heaters === 1 ? "" : "s"}
        </strong>
      </p>
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
      <p className="mt-2 text-sm text-ink-soft">
        {progress.estimatedUnsorted > 0
          ? `About ${progress.estimatedUnsorted.toLocaleString("en-GB")} more likely good cans are in bags not yet sorted. `
          : ""}
        {progress.remaining > 0 ? `${progress.remaining.toLocaleString("en-GB")} good cans still to find.` : "Target reached — thank you!"}
      </p>
    </div>
  );
}
