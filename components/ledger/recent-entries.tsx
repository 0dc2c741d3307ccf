"use client";

import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { Card, EmptyState, Skeleton } from "@/components/ui/card";
import { FormError } from "@/components/ui/field";
import { ledgerQueries, useUndoMovement, type MyEntry } from "@/hooks/queries/ledger";
import { useFormat } from "@/hooks/use-look";
import { capitalise, kindLabel, stageLabel } from "@/lib/ledger/labels";
import { countOf, noun } from "@/lib/plural";

function describe(e: MyEntry): string {
  const d = e.details as Record<string, unknown>;
  switch (e.kind) {
    case "haul":
      return `Haul from ${e.dropPoint ?? "a drop point"}: ≈${countOf(Number(e.estimated), "can")}`;
    case "sort":
      return `Sort: ${Number(d.good)} good, ${Number(d.counted) - Number(d.good)} rejected`;
    case "processing": {
      // Older entries carry no quantity in their details; their lines all went to `to`.
      const lost = d.lost as { quantity: number } | undefined;
      const moved = typeof d.quantity === "number" ? d.quantity : e.counted;
      return `${capitalise(stageLabel(String(d.to)))}: ${countOf(Number(moved), "can")}${lost ? `, ${lost.quantity} lost` : ""}`;
    }
    case "stockCount":
      return `Stock count: ${countOf((d.lines as unknown[] | undefined)?.length ?? 0, noun("stage"))} adjusted`;
    case "claim":
      return `Claimed ${countOf(Number(e.counted), "can")}`;
    case "builtIn":
      return `Built in ${countOf(Number(e.counted), "can")}`;
    default:
      return `${capitalise(kindLabel(e.kind))}: ${countOf(Number(e.counted), "can")}`;
  }
}

export function RecentEntries() {
  const f = useFormat();
  const entries = useQuery(ledgerQueries.mine());
  const [error, setError] = useState<string | null>(null);
  const undo = useUndoMovement({ onSuccess: () => setError(null), onError: (e) => setError(e.message) });
  return (
    <Card title="Your recent entries">
      <FormError message={error} />
      {entries.isPending ? (
        <Skeleton className="h-20 w-full" />
      ) : entries.isError ? (
        <p className="text-alarm">Could not load your entries. Pull to refresh when you have a connection.</p>
      ) : entries.data.length === 0 ? (
        <EmptyState title="Nothing logged yet">Your hauls, sorts and processing show here, with an undo.</EmptyState>
      ) : (
        <ul className="divide-y divide-paper-edge" data-testid="recent-entries">
          {entries.data.map((e) => (
            <li key={e.movementId} className="flex items-center justify-between gap-3 py-2">
              <span className={e.undone ? "text-ink-faint line-through" : ""}>
                {describe(e)}
                <span className="block text-sm text-ink-faint">
                  {f.moment(e.occurredAt)}{e.undone ? " · undone" : ""}
                </span>
              </span>
              {e.undone ? null : (
                <Button type="button" variant="secondary" disabled={undo.isPending} onClick={() => undo.mutate({ movementId: e.movementId })} aria-label={`Undo ${describe(e)}`}>
                  Undo
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
