"use client";

import { useInfiniteQuery } from "@tanstack/react-query";
import { useMemo } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { EmptyState, Skeleton } from "@/components/ui/card";
import { ledgerQueries } from "@/hooks/queries/ledger";
import type { LogDrive } from "@/lib/drives/types";
import { LedgerFilters } from "./ledger-table-filters";
import { LedgerLine } from "./ledger-table-row";
import { useLedgerFilters } from "./ledger-table-url";
import { useFormat } from "@/hooks/use-look";

/** "Showing 50 of 600 lines"; past the count's cap "Showing 50 of more than 1,000 lines". */
function shownOf(shown: number, total: number | null, over: boolean, more: boolean, f: ReturnType<typeof useFormat>): string {
  // Every page loaded: what is shown is all there is, whatever the first page counted.
  if (total === null || (over && !more)) return `Showing ${f.count(shown, "line")}`;
  // Lines logged since the first page can make the pages hold more than it counted.
  return `Showing ${f.number(shown)} of ${over ? "more than " : ""}${f.count(Math.max(total, shown), "line")}`;
}

export function LedgerTable({ drives, people, initialDriveId }: { drives: LogDrive[]; people: { id: string; name: string }[]; initialDriveId: string }) {
  const f = useFormat();
  const { filters, set, query } = useLedgerFilters(initialDriveId);
  const pages = useInfiniteQuery(ledgerQueries.list(filters as Record<string, string>, query));
  const rows = useMemo(() => pages.data?.pages.flatMap((p) => p.rows) ?? [], [pages.data]);
  const first = pages.data?.pages[0];
  // The lines of one movement are undone together; the confirmation names them all.
  const byMovement = useMemo(() => {
    const m = new Map<string, string[]>();
    for (const r of rows) m.set(r.movementId, [...(m.get(r.movementId) ?? []), r.id]);
    return m;
  }, [rows]);

  return (
    <div className="flex flex-col gap-3">
      <LedgerFilters drives={drives} people={people} filters={filters} set={set} />
      <div>
        <a className={buttonClass("secondary")} href={`/api/ledger/export?${query}`} download>
          Download CSV
        </a>
      </div>
      {pages.isPending ? (
        <Skeleton className="h-40 w-full" />
      ) : pages.isError ? (
        <p role="alert" className="text-alarm">Could not load the ledger: {pages.error.message}. Change a filter or reload to try again.</p>
      ) : rows.length === 0 ? (
        <EmptyState title="No ledger lines match">Widen the dates or clear a filter.</EmptyState>
      ) : (
        <>
          <div className="relative overflow-x-auto">
            <table className="w-full min-w-[820px] text-left text-sm">
              <caption className="sr-only">Ledger lines, newest first by when they happened</caption>
              <thead className="border-b-2 border-ink/30">
                <tr>
                  {["Line", "When", "Entry", "Drive", "Drop point / unit", "Move", "Cans", "Reason", "By", "Correct"].map((h) => (
                    <th key={h} scope="col" className={`px-2 py-2 ${h === "Drive" && filters.driveId ? "hidden" : ""}`}>{h === "Correct" ? <span className="sr-only">{h}</span> : h}</th>
                  ))}
                </tr>
              </thead>
              <tbody className="divide-y divide-paper-edge">
                {rows.map((r) => (
                  <LedgerLine key={r.id} r={r} siblings={byMovement.get(r.movementId) ?? [r.id]} showDrive={!filters.driveId} />
                ))}
              </tbody>
            </table>
          </div>
          <p role="status" className="flex flex-wrap items-center gap-3 text-sm">
            <span data-testid="ledger-count">{shownOf(rows.length, first?.total ?? null, first?.totalOver ?? false, pages.hasNextPage, f)}</span>
            {pages.hasNextPage ? (
              <Button variant="secondary" onClick={() => pages.fetchNextPage()} disabled={pages.isFetchingNextPage}>
                {pages.isFetchingNextPage ? "Loading…" : "Load more"}
              </Button>
            ) : null}
          </p>
        </>
      )}
    </div>
  );
}
