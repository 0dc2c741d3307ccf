import Link from "next/link";
import { EmptyState } from "@/components/ui/card";
import { SEARCH_KINDS, SEARCH_KIND_LABEL, type SearchHit } from "@/lib/search/schemas";

/** Results grouped by what they are, each a link to the record. */
export function SearchResults({ q, results }: { q: string; results: SearchHit[] }) {
  if (!results.length) {
    return <EmptyState title={`Nothing found for \u201c${q}\u201d`}>Try a shorter word, or part of a name, address or note.</EmptyState>;
  }
  return (
    <div className="flex flex-col gap-5">
      {SEARCH_KINDS.map((kind) => {
        const hits = results.filter((r) => r.kind === kind);
        if (!hits.length) return null;
        return (
          <section key={kind} aria-labelledby={`found-${kind}`}>
            <h2 id={`found-${kind}`} className="mb-2 text-lg">
              {SEARCH_KIND_LABEL[kind]} <span className="font-normal text-ink-faint">({hits.length})</span>
            </h2>
            <ul className="divide-y divide-paper-edge rounded-card border border-paper-edge bg-white/70">
              {hits.map((hit) => (
                <li key={`${hit.kind}-${hit.id}`}>
                  <Link href={hit.href} className="flex min-h-11 flex-col px-4 py-2 no-underline hover:bg-paper-deep">
                    <span className="font-semibold text-ember-deep underline">{hit.title}</span>
                    <span className="text-sm text-ink-soft">{hit.detail}</span>
                  </Link>
                </li>
              ))}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
