/** A moment as people read it across Cantrove: "2 Dec 2026, 08:40". */
export function formatDateTime(value: string | Date, timeZone?: string): string {
  return new Date(value).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone });
}
