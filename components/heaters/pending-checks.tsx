/** What stands in for results while the planner's checks load, or when they could not (offline). */
export function PendingChecks({ failed }: { failed: boolean }) {
  return failed ? (
    <p role="alert" className="font-semibold text-alarm">
      The planner could not load its checks: the connection dropped before they arrived. Once you are back online, reload the page to go on
      (note what you typed: a reload starts from the opening sheets).
    </p>
  ) : (
    <p role="status" className="text-ink-soft">
      Checking what you typed…
    </p>
  );
}
