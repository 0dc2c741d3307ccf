"use client";

import { useQuery } from "@tanstack/react-query";
import { Card, Skeleton } from "@/components/ui/card";
import { ledgerQueries } from "@/hooks/queries/ledger";

const ROWS = [
  ["hauled", "Hauled, not sorted (estimate)"],
  ["good", "Good, not washed"],
  ["washed", "Washed"],
  ["opened", "Opened"],
  ["punched", "Punched"],
  ["builtIn", "Built in"],
] as const;

export function StockCard({ driveId }: { driveId: string }) {
  const stock = useQuery(ledgerQueries.stock(driveId));
  return (
    <Card title="Cans on hand">
      {stock.isPending ? (
        <Skeleton className="h-24 w-full" />
      ) : stock.isError ? (
        <p className="text-alarm">Could not load the stock: {stock.error.message}</p>
      ) : (
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1" data-testid="stock">
          {ROWS.map(([key, label]) => (
            <div key={key} className="contents">
              <dt className="text-ink-soft">{label}</dt>
              <dd className="text-right font-semibold tabular-nums" data-stage={key}>
                {key === "hauled" ? "≈" : ""}
                {stock.data.stages[key]}
              </dd>
            </div>
          ))}
          <dt className="text-ink-soft">Claimed by builders</dt>
          <dd className="text-right font-semibold tabular-nums" data-stage="claimed">{stock.data.claimed}</dd>
          <dt className="text-ink-soft">Unclaimed</dt>
          <dd className="text-right font-semibold tabular-nums" data-stage="unclaimed">{stock.data.unclaimed}</dd>
        </dl>
      )}
    </Card>
  );
}
