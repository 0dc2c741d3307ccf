import { spanText, timingWarning, type DriveSpan } from "@/lib/drives/current-drive";
import type { Look } from "@/lib/format/look";

/**
 * The drive entries on this page go to, always in sight where cans are entered,
 * with a plain warning when that drive is not running today.
 */
export function DriveBanner({ drive, today, lead = "Logging for", rememberError, look }: { drive: DriveSpan; today: string; lead?: string; rememberError?: string | null; look?: Pick<Look, "locale"> }) {
  const warning = timingWarning(drive, today, look);
  return (
    <div data-testid="current-drive" aria-live="polite" className={`rounded-card border-l-8 p-3 ${warning ? "border-sun bg-sun-soft" : "border-moss bg-moss-soft"}`}>
      <p>
        {lead}: <strong data-testid="current-drive-name">{drive.name}</strong> <span className="text-ink-soft">(runs {spanText(drive, look)})</span>
      </p>
      {warning ? (
        <p data-testid="current-drive-warning" className="mt-1 font-semibold">
          {warning} Check that this is the drive you mean before you enter anything.
        </p>
      ) : null}
      {rememberError ? (
        <p role="alert" className="mt-1 text-sm font-semibold text-alarm">
          {rememberError}
        </p>
      ) : null}
    </div>
  );
}
