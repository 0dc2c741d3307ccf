/**
 * "This bin is full" episodes. A fill episode at a drop point runs from its
 * last haul (or from the start) to the next haul. The first report at or
 * above three quarters in an episode alerts the organisers; later reports in
 * the same episode do not.
 */
export const ALERT_LEVEL = 75;

export function shouldAlert(level: number, lastAlertAt: Date | null, lastHaulAt: Date | null): boolean {
  if (level < ALERT_LEVEL) return false;
  if (!lastAlertAt) return true;
  return lastHaulAt !== null && lastHaulAt.getTime() > lastAlertAt.getTime();
}

export const LEVEL_LABEL: Record<number, string> = {
  0: "Empty",
  25: "About a quarter full",
  50: "About half full",
  75: "About three quarters full",
  100: "Full — no room left",
};
