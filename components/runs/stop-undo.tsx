"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/field";
import { useUndoStopHaul, useUnskipStop } from "@/hooks/queries/runs";
import { newKey } from "@/lib/api/idempotency-key";


/** A skipped stop goes back on the run, pending, to be logged or skipped again. */
export function UnskipStop({ runId, stopId, dropPointName }: { runId: string; stopId: string; dropPointName: string }) {
  const unskip = useUnskipStop(runId, stopId);
  return (
    <div className="mt-2 flex flex-col gap-1">
      <Button type="button" variant="secondary" aria-label={`Put ${dropPointName} back on the run`} disabled={unskip.isPending} onClick={() => unskip.mutate()}>
        {unskip.isPending ? "Saving…" : "Put back on the run"}
      </Button>
      <FormError message={unskip.isError ? unskip.error.message : null} />
    </div>
  );
}

/**
 * Undoes the stop's haul in the ledger (a reversing entry; both stay in its
 * history), which puts the stop back to pending so the right haul can be logged.
 */
export function UndoStopHaul({ movementId, dropPointName }: { movementId: string; dropPointName: string }) {
  const [asking, setAsking] = useState(false);
  const [key] = useState(newKey);
  // After the undo the run is read again (by the hook): the stop it reopened comes back pending.
  const undo = useUndoStopHaul(movementId, key);
  if (!asking) {
    return (
      <Button type="button" variant="quiet" className="mt-2" onClick={() => setAsking(true)}>
        Undo this haul
      </Button>
    );
  }
  return (
    <div role="alertdialog" aria-label={`Undo the haul at ${dropPointName}`} className="mt-2 rounded-lg border-2 border-sun bg-sun-soft p-3">
      <p>Undo this haul? It is taken back out of the ledger (the undo stays in its history) and the stop is open to log again.</p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button type="button" disabled={undo.isPending} onClick={() => undo.mutate()}>
          {undo.isPending ? "Saving…" : "Yes, undo it"}
        </Button>
        <Button type="button" variant="secondary" disabled={undo.isPending} onClick={() => setAsking(false)}>
          No, keep it
        </Button>
      </div>
      <FormError message={undo.isError ? undo.error.message : null} />
    </div>
  );
}
