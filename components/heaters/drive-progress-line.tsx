import type { DriveWithTarget } from "@/lib/heaters/drive-targets";
import { formatNumber } from "@/lib/heaters/format";

/** "Good cans for N of M heaters" with the target beside it, wherever a drive's progress shows. */
export function DriveProgressLine({ drive }: { drive: DriveWithTarget }) {
  const { target } = drive;
  return (
    <div className="flex flex-col gap-1" data-testid={`drive-target-${drive.slug}`}>
      <p>
        Target <strong>{formatNumber(target.cans)} cans</strong>: {formatNumber(target.heaterCans)} for {target.heaters}{" "}
        {target.heaters === 1 ? "heater" : "heaters"} + {formatNumber(target.spare)} spare ({formatNumber(drive.sparePercent, 1)} %).
      </p>
      <p className="font-semibold text-moss-deep" data-testid={`drive-covered-${drive.slug}`}>
        Good cans for {drive.covered} of {target.heaters} {target.heaters === 1 ? "heater" : "heaters"} ({formatNumber(drive.goodCans)} counted).
      </p>
    </div>
  );
}
