import type { DriveWithTarget } from "@/lib/heaters/drive-targets";
import { formatNumber } from "@/lib/heaters/format";
import { countOf } from "@/lib/plural";
import { heatersCoveredText } from "@/lib/drives/progress-wording";

/** "Good cans for N of M heaters" with the target beside it, wherever a drive's progress shows. */
export function DriveProgressLine({ drive }: { drive: DriveWithTarget }) {
  const { target } = drive;
  return (
    <div className="flex flex-col gap-1" data-testid={`drive-target-${drive.slug}`}>
      <p>
        Target <strong>{countOf(target.cans, "can", formatNumber)}</strong>: {formatNumber(target.heaterCans)} for {countOf(target.heaters, "heater")} +{" "}
        {formatNumber(target.spare)} spare ({formatNumber(drive.sparePercent, 1)} %).
      </p>
      <p className="font-semibold text-moss-deep" data-testid={`drive-covered-${drive.slug}`}>
        {heatersCoveredText(drive.covered, target.heaters)} ({formatNumber(drive.goodCans)} counted).
      </p>
    </div>
  );
}
