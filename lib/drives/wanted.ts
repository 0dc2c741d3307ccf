// The organiser's own words on which cans a drive wants, shown beside the
// standard lists. Pure; safe in the client.

const STOP = new Set(["a", "an", "and", "the", "of", "or", "on", "please", "only", "with", "we", "want", "need", "our", "your", "all", "be", "are", "is", "to"]);

const words = (text: string) =>
  text
    .toLowerCase()
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .split(/[^a-z0-9]+/)
    .filter((w) => w && !STOP.has(w));

/**
 * What the organiser's text adds to the standard lists: its sentences (or
 * lines) that say something the lists do not, in their own words and order.
 * A sentence every word of which the lists already use ("Standard 355 mL
 * aluminium drink cans, rinsed, not crushed.") would only repeat them, so it
 * is left out; empty when nothing is left.
 */
export function wantedExtra(extra: string, standard: readonly string[]): string {
  const known = new Set(standard.flatMap(words));
  const sentences = extra.split(/(?<=[.!?])\s+|\n+/).map((s) => s.trim()).filter(Boolean);
  return sentences.filter((s) => words(s).some((w) => !known.has(w))).join(" ");
}
