/** Lower-case ASCII words joined by hyphens, accents dropped ("Rosé Hall" → "rose-hall"); safe in the browser. */
export function toSlug(text: string, maxLength: number): string {
  return text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, maxLength);
}
