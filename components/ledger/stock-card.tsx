"use client";

import { useQuery } from "@tanstack/react-query";
import { Card } from "@/components/ui/card";
import { ledgerQueries } from "@/hooks/queries/ledger";

const ROWS = [
  ["hauled", "Hauled, not sorted (estimate)"],
  ["good", "Good, not washed"],
  ["washed", "Washed"],
  ["opened", "Opened"],
  ["punched", "Punched"],
  ["builtIn", "Built in"],
] as const;

const Blank = () => <span aria-hidden="true" className="inline-block h-4 w-10 animate-pulse rounded bg-paper-deep align-middle" />;

export function StockCard({ driveId }: { driveId: string }) {
  const stock = useQuery(ledgerQueries.stock(driveId));
  return (
    <Card title="Cans on hand">
      {stock.isError ? (
        <p className="text-alarm">Could not load the stock: {stock.error.message}</p>
      ) : (
        // While the figures load, the same rows with blank values: the card keeps its height.
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1" data-testid={stock.data ? "stock" : undefined} aria-busy={stock.isPending || undefined}>
          {ROWS.map(([key, label]) => (
            <div key={key} className="contents">
              <dt className="text-ink-soft">{label}</dt>
              <dd className="text-right font-semibold tabular-nums" data-stage={stock.data ? key : undefined}>
                {stock.data ? `${key === "hauled" ? "≈" : ""}${stock.data.stages[key]}` : <Blank />}
              </dd>
            </div>
          ))}
          <dt className="text-ink-soft">Claimed by builders</dt>
          <dd className="text-right font-semibold tabular-nums" data-stage={stock.data ? "claimed" : undefined}>{stock.data ? stock.data.claimed : <Blank />}</dd>
          <dt className="text-ink-soft">Unclaimed</dt>
          <dd className="text-right font-semibold tabular-nums" data-stage={stock.data ? "unclaimed" : undefined}>{stock.data ? stock.data.unclaimed : <Blank />}</dd>
        </dl>
      )}
    </Card>
  );
}
