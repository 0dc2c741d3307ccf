import { z } from "zod";

// The organiser's search box (GET /api/search?q=, the /search page).
export const SEARCH_MIN = 2;
export const SEARCH_MAX = 100;

export const searchQuerySchema = z.object({
  q: z
    .string()
    .trim()
    .min(SEARCH_MIN, `Type at least ${SEARCH_MIN} letters to search.`)
    .max(SEARCH_MAX, `Keep the search under ${SEARCH_MAX} characters.`),
});
export type SearchQuery = z.infer<typeof searchQuerySchema>;

export const SEARCH_KINDS = ["drive", "dropPoint", "heaterUnit", "member", "ledgerNote"] as const;
export type SearchKind = (typeof SEARCH_KINDS)[number];

export const SEARCH_KIND_LABEL: Record<SearchKind, string> = {
  drive: "Drives",
  dropPoint: "Drop points",
  heaterUnit: "Heater units",
  member: "People",
  ledgerNote: "Ledger notes",
};

export interface SearchHit {
  kind: SearchKind;
  id: string;
  title: string;
  /** A line of context: where the words matched, or what the record is. */
  detail: string;
  href: string;
}
