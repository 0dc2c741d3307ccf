import type { Metadata } from "next";
import { Notice } from "@/components/ui/notice";
import { SearchBox } from "@/components/search/search-box";
import { SearchResults } from "@/components/search/search-results";
import { requirePageRole } from "@/lib/auth/session";
import { searchQuerySchema } from "@/lib/search/schemas";
import { searchGroup } from "@/lib/search/queries";

export const metadata: Metadata = { title: "Search" };

export default async function SearchPage({ searchParams }: { searchParams: Promise<{ q?: string | string[] }> }) {
  const actor = await requirePageRole("/search", "organiser");
  const raw = (await searchParams).q;
  const typed = (Array.isArray(raw) ? raw[0] : raw) ?? "";
  const parsed = typed.trim() ? searchQuerySchema.safeParse({ q: typed }) : null;
  const results = parsed?.success ? await searchGroup(actor.group.id, parsed.data.q) : null;
  return (
    <main className="flex flex-col gap-5">
      <h1 className="text-3xl">Search {actor.group.name}</h1>
      <SearchBox value={typed} id="page-search" name="Search again" />
      {parsed && !parsed.success ? <Notice tone="caution" title="Search not run">{parsed.error.issues[0]?.message}</Notice> : null}
      {results && parsed?.success ? <SearchResults q={parsed.data.q} results={results} /> : null}
      {!parsed ? <p className="text-ink-soft">Find a drive, drop point, heater unit, person or ledger note by any word in it.</p> : null}
    </main>
  );
}
